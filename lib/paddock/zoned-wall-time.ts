import { isoDateParts } from "../scrutineer/calendar/iso-date-parts";
import { zoneOffsetMinutes } from "../scrutineer/calendar/zone-offset-minutes";

/**
 * How a wall-clock time met the zone's clock on that date:
 * - "exact": it happens once;
 * - "gap": it never happens (the clocks jumped over it, spring forward); the instant is read with
 *   the offset in force before the jump, so it lands as far after the jump as it was into the gap
 *   (01:30 on a day London jumps 01:00 → 02:00 becomes 02:30 BST);
 * - "repeated": it happens twice (the clocks went back, fall back); the instant is the first one
 *   (01:30 on a day New York goes 02:00 EDT → 01:00 EST is 01:30 EDT).
 * Both rules are RFC 5545 §3.3.5's for DATE-TIME with a TZID, and Temporal's "compatible".
 */
export type WallTimeFit = "exact" | "gap" | "repeated";

export type ZonedWallTime = {
  /** Milliseconds since the Unix epoch. */
  utcMs: number;
  /** The same instant as an ISO string in UTC ("2027-03-28T08:00:00.000Z"). */
  instant: string;
  fit: WallTimeFit;
};

const dayMs = 86_400_000;

/**
 * The UTC instant of a local wall-clock time on a calendar date in an IANA zone, using Intl only
 * (no clock). Gaps and repeats are resolved as RFC 5545 §3.3.5 says (see {@link WallTimeFit}).
 * Assumes at most one change of offset within a day either side of the time, which holds for
 * every zone in the tz database's rules for event days.
 * @param date the venue's calendar date, "YYYY-MM-DD"
 * @param time the wall-clock time, 24-hour "HH:MM"
 * @param timeZone an IANA zone name ("Europe/London"); RangeError when the runtime does not know it
 */
export function zonedWallTime({
  date,
  time,
  timeZone,
}: {
  date: string;
  time: string;
  timeZone: string;
}): ZonedWallTime {
  const { year, month, day } = isoDateParts(date);
  const m = /^([01]\d|2[0-3]):([0-5]\d)$/.exec(time);
  if (m?.[1] === undefined || m[2] === undefined) {
    throw new RangeError(`Not a 24-hour time: "${time}"`);
  }
  // The wall time read as if it were UTC; the real instant is this minus the offset in force.
  const wallMs = Date.UTC(year, month - 1, day, Number(m[1]), Number(m[2]));
  const before = zoneOffsetMinutes(wallMs - dayMs, timeZone);
  const after = zoneOffsetMinutes(wallMs + dayMs, timeZone);
  const candidates = [...new Set([before, after])]
    .map((offset) => wallMs - offset * 60_000)
    .filter((utcMs) => wallMs - zoneOffsetMinutes(utcMs, timeZone) * 60_000 === utcMs)
    .sort((a, b) => a - b);
  const first = candidates[0];
  if (first !== undefined) {
    return {
      utcMs: first,
      instant: new Date(first).toISOString(),
      fit: candidates.length > 1 ? "repeated" : "exact",
    };
  }
  const utcMs = wallMs - before * 60_000;
  return { utcMs, instant: new Date(utcMs).toISOString(), fit: "gap" };
}
