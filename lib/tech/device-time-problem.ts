/**
 * How far ahead of the server's clock a phone's clock may run before its records are refused:
 * the same grace a pass gets for a slow phone clock (lib/passes). Common practice (no source):
 * a phone on network time is within seconds; minutes cover one set by hand.
 */
export const MAX_DEVICE_CLOCK_AHEAD_MINUTES = 5;

/**
 * Why a record's device time cannot be taken, or null. "Latest wins" between checklist answers
 * and overrides goes by device time, so a phone whose clock runs far ahead would win forever:
 * a record dated more than {@link MAX_DEVICE_CLOCK_AHEAD_MINUTES} minutes after the server
 * received it is refused, with words that say what to fix.
 */
export function deviceTimeProblem(deviceTime: string, receivedAt: Date): string | null {
  const at = Date.parse(deviceTime);
  if (!Number.isFinite(at)) return "The time on this record cannot be read.";
  const aheadMs = at - receivedAt.getTime();
  if (aheadMs <= MAX_DEVICE_CLOCK_AHEAD_MINUTES * 60_000) return null;
  return "This record is dated later than now: the phone's clock is wrong. Set the phone's date, time and time zone to automatic, then record it again.";
}
