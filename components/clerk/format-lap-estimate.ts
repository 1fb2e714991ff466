import { formatLapTime as formatMs } from "@/lib/paddock/format-lap-time";

/** A driver's lap-time estimate as m:ss.s ("1:42.5"), or says none was given. */
export function formatLapEstimate(lapTimeMs: number | null): string {
  return lapTimeMs === null ? "no estimate" : formatMs(lapTimeMs);
}
