"use client";
import { usePathname } from "next/navigation";
import type { ReactNode } from "react";
import { isBoardPath } from "./is-board-path";

/** The header's row: as wide as the page's column, the whole screen on the paddock board. */
export function SiteHeaderRow({ children }: { children: ReactNode }) {
  const board = isBoardPath(usePathname());
  return (
    <div
      className={`flex items-center justify-between gap-3 py-2 ${board ? "w-full px-3 sm:px-4 2xl:px-6" : "mx-auto max-w-5xl px-4"}`}
    >
      {children}
    </div>
  );
}
