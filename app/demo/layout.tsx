import { notFound } from "next/navigation";
import type { ReactNode } from "react";
import { isDemo } from "@/lib/env";

export const dynamic = "force-dynamic";

/** Everything under /demo exists only when PLUMBLINE_MODE=demo; a live server answers 404.
 *  (Each page checks too, so a page moved out of this folder stays closed.) */
export default function DemoLayout({ children }: { children: ReactNode }) {
  if (!isDemo) notFound();
  return children;
}
