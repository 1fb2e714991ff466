import { isoDateParts } from "../scrutineer/calendar/iso-date-parts";
import { zoneOffsetMinutes } from "../scrutineer/calendar/zone-offset-minutes";

/** How long a pass stays good after the event's local date has ended, in seconds: covers a
 *  late finish and a phone clock that runs a little fast. */
export const defaultPassExpiryMarginSeconds = 2 * 3600;

const hourMs = 3_600_000;

/** The zone's offset from UTC at an instant, in milliseconds (local wall time − UTC). */
const zoneOffsetMs = (epochMs: number, timeZone: string) =>
  zoneOffsetMinutes(epochMs, timeZone) * 60_000;

/**
 * The instant the local calendar date `localDate` ends in `timeZone` — the first moment of the
 * next local day — in milliseconds since the Unix epoch. Works from the zone's rules through
 * Intl, so daylight-saving days are 23 or 25 hours long as they are at the venue.
 * Where local midnight shows twice (clocks go back from 01:00 to 00:00) the first one counts;
 * where it never shows (clocks go forward at midnight) the moment the clocks jump counts.
 * @param localDate ISO calendar date "YYYY-MM-DD" at the venue
 * @param timeZone IANA zone name, e.g. "Europe/London"; RangeError when the runtime lacks it
 */
export function endOfLocalDateMs(localDate: string, timeZone: string): number {
  const { year, month, day } = isoDateParts(localDate);
  // The next day's 00:00 written as if it were UTC; the real instant is this minus the offset.
  const wall = Date.UTC(year, month - 1, day + 1);
  // Offsets run from −12 h to +14 h, so the answer lies in [wall − 14 h, wall + 12 h]; take the
  // offsets either side of that window (no zone changes offset twice within it).
  const lo = wall - 15 * hourMs;
  const hi = wall + 13 * hourMs;
  const before = zoneOffsetMs(lo, timeZone);
  const after = zoneOffsetMs(hi, timeZone);
  if (before === after) return wall - before;
  const candidates = [wall - before, wall - after].filter(
    (t) => zoneOffsetMs(t, timeZone) === wall - t,
  );
  // Both can be real when clocks go back across midnight (01:00 → 00:00 shows 00:00 twice);
  // the day ends at the first, since the second still belongs to the next day.
  if (candidates.length > 0) return Math.min(...candidates);
  // Local midnight was skipped: find the second at which the offset changed.
  let a = Math.floor(lo / 1000);
  let b = Math.ceil(hi / 1000);
  while (b - a > 1) {
    const mid = Math.floor((a + b) / 2);
    if (zoneOffsetMs(mid * 1000, timeZone) === before) a = mid;
    else b = mid;
  }
  return b * 1000;
}

/** When a pass is good: issued-at and expiry as NumericDate seconds (RFC 7519 §2). */
export type PassValidityWindow = { iat: number; exp: number };

/**
 * The validity window of a pass issued at `issuedAt` for an event on `eventDate` in `timeZone`:
 * from issue until the end of the event's local date plus `marginSeconds`. When the event is
 * already over, `exp` is at or before `iat`; the caller refuses to issue.
 * @param issuedAt the issuing clock reading (a parameter: this code never reads the clock)
 * @param marginSeconds grace after local midnight, seconds
 */
export function passValidityWindow({
  issuedAt,
  eventDate,
  timeZone,
  marginSeconds = defaultPassExpiryMarginSeconds,
}: {
  issuedAt: Date;
  eventDate: string;
  timeZone: string;
  marginSeconds?: number;
}): PassValidityWindow {
  const iat = Math.floor(issuedAt.getTime() / 1000);
  const exp = Math.floor(endOfLocalDateMs(eventDate, timeZone) / 1000) + marginSeconds;
  return { iat, exp };
}
