/** A lap time in milliseconds as minutes, seconds and tenths ("2:05.3"), rounded to the tenth. */
export function formatLapTime(ms: number): string {
  const tenths = Math.round(ms / 100);
  const minutes = Math.floor(tenths / 600);
  const seconds = (tenths % 600) / 10;
  return `${minutes}:${seconds.toFixed(1).padStart(4, "0")}`;
}
