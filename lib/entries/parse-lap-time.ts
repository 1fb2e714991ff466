/** The longest lap estimate taken: 20 minutes (a club circuit lap is a minute or three). */
export const MAX_LAP_TIME_MS = 20 * 60_000;

/**
 * A lap time typed as minutes and seconds ("1:52", "1:52.4", "0:58.25") → milliseconds; null
 * when it is not written that way or is not a plausible lap (zero, or over 20 minutes).
 */
export function parseLapTime(text: string): number | null {
  const match = /^(\d{1,2}):([0-5]\d)(?:\.(\d{1,3}))?$/.exec(text.trim());
  if (!match) return null;
  const minutes = Number(match[1]);
  const seconds = Number(match[2]);
  const fraction = match[3] ? Number(match[3].padEnd(3, "0")) : 0;
  const ms = (minutes * 60 + seconds) * 1000 + fraction;
  if (ms <= 0 || ms > MAX_LAP_TIME_MS) return null;
  return ms;
}
