"use client";
import { useEffect, useState } from "react";

/** How often the board looks at the clock: sessions start and end on the minute, so a few
 *  seconds late is never a whole minute late. */
export const BOARD_TICK_MS = 5_000;

/**
 * This screen's clock (ms), ticking every few seconds. Starts at `initialMs` so the server's
 * render and the browser's first render agree, then follows the screen's own clock.
 */
export function useScreenClock(initialMs: number): number {
  const [ms, setMs] = useState(initialMs);
  useEffect(() => {
    setMs(Date.now());
    const id = setInterval(() => setMs(Date.now()), BOARD_TICK_MS);
    return () => clearInterval(id);
  }, []);
  return ms;
}
