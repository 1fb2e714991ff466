/** Milliseconds → "m:ss" or "m:ss.s…" (tenths/hundredths/thousandths only when there are any). */
export function formatLapTime(ms: number): string {
  const minutes = Math.floor(ms / 60_000);
  const seconds = Math.floor((ms % 60_000) / 1000);
  const rest = ms % 1000;
  const fraction = rest === 0 ? "" : `.${String(rest).padStart(3, "0").replace(/0+$/, "")}`;
  return `${minutes}:${String(seconds).padStart(2, "0")}${fraction}`;
}
