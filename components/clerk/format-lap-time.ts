/** A lap-time estimate in milliseconds as m:ss.s ("1:42.5"); says so when none was given. */
export function formatLapTime(lapTimeMs: number | null): string {
  if (lapTimeMs === null) return "no estimate";
  const tenths = Math.round(lapTimeMs / 100);
  const minutes = Math.floor(tenths / 600);
  const seconds = (tenths % 600) / 10;
  return `${minutes}:${seconds.toFixed(1).padStart(4, "0")}`;
}
