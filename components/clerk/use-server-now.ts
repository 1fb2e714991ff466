"use client";
import { useEffect, useState } from "react";

/** The server's clock as the page last read it, ticking on every 30 s in the browser, so the
 *  day's shifts follow the same clock as the server (lib/clock.ts, which a demo may set). */
export function useServerNow(serverNow: string): string {
  const [offsetMs] = useState(() => Date.parse(serverNow) - Date.now());
  const [now, setNow] = useState(serverNow);
  useEffect(() => {
    const tick = () => setNow(new Date(Date.now() + offsetMs).toISOString());
    const id = setInterval(tick, 30_000);
    return () => clearInterval(id);
  }, [offsetMs]);
  return Date.parse(serverNow) > Date.parse(now) ? serverNow : now;
}
