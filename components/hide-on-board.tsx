"use client";
import { usePathname } from "next/navigation";
import type { ReactNode } from "react";
import { isBoardPath } from "./is-board-path";

/** Shows its children everywhere but on the paddock board: a public screen, where nobody signs
 *  in and a signed-in official's name has no business being on a TV across the paddock. Also
 *  hidden on the "No signal" page (`.no-signal-page`): that saved copy cannot know who is signed
 *  in, so it must show neither a name nor "Sign in". */
export function HideOnBoard({ children }: { children: ReactNode }) {
  if (isBoardPath(usePathname())) return null;
  return (
    <div className="contents [body:has(.no-signal-page)_&]:hidden" data-account-area>
      {children}
    </div>
  );
}
