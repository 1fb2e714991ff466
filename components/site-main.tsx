"use client";
import { usePathname } from "next/navigation";
import type { ReactNode } from "react";
import { isBoardPath } from "./is-board-path";

/** The page's main column: 5xl wide as usual, the whole screen for the paddock board (a TV). */
export function SiteMain({ children }: { children: ReactNode }) {
  const board = isBoardPath(usePathname());
  return (
    <main
      className={
        board
          ? "w-full flex-1 px-3 py-3 sm:px-4 2xl:px-6"
          : "mx-auto w-full max-w-5xl flex-1 px-4 py-6"
      }
    >
      {children}
    </main>
  );
}
