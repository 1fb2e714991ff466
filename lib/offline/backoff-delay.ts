/**
 * Exponential backoff with full jitter: base·2^attempts, capped, times a random factor in
 * [0.5, 1.5). `random` is a parameter so the delay is testable.
 */
export function backoffDelayMs(
  attempts: number,
  random: number,
  baseMs = 2000,
  maxMs = 120_000,
): number {
  const exp = Math.min(maxMs, baseMs * 2 ** Math.max(0, attempts - 1));
  return Math.round(exp * (0.5 + Math.min(Math.max(random, 0), 0.999999)));
}
