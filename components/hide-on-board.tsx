"use client";
import { usePathname } from "next/navigation";
import type { ReactNode } from "react";
import { isBoardPath } from "./is-board-path";

/** Shows its children everywhere but on the paddock board: a public screen, where nobody signs
 *  in and a signed-in official's name has no business being on a TV across the paddock. */
export function HideOnBoard({ children }: { children: ReactNode }) {
  return isBoardPath(usePathname()) ? null : children;
}
