import { zoneOffsetMinutes } from "../scrutineer/calendar/zone-offset-minutes";

const pad = (n: number, width = 2) => String(n).padStart(width, "0");

/**
 * An instant as the venue's local date and time with its UTC offset, ISO 8601
 * ("2027-03-28T09:00:00+01:00"), for exports and for showing times in the event's zone.
 * Pure: the instant is a parameter.
 * @param instant an ISO date-time string with offset or Z, or milliseconds since the Unix epoch
 * @param timeZone an IANA zone name; RangeError when the runtime does not know it
 */
export function localIsoDateTime(instant: string | number, timeZone: string): string {
  const utcMs = new Date(instant).getTime();
  if (Number.isNaN(utcMs)) throw new RangeError(`Not an instant: "${String(instant)}"`);
  const offset = zoneOffsetMinutes(utcMs, timeZone);
  const wall = new Date(Math.floor(utcMs / 1000) * 1000 + offset * 60_000);
  const sign = offset < 0 ? "-" : "+";
  const abs = Math.abs(Math.round(offset));
  return (
    `${pad(wall.getUTCFullYear(), 4)}-${pad(wall.getUTCMonth() + 1)}-${pad(wall.getUTCDate())}` +
    `T${pad(wall.getUTCHours())}:${pad(wall.getUTCMinutes())}:${pad(wall.getUTCSeconds())}` +
    `${sign}${pad(Math.floor(abs / 60))}:${pad(abs % 60)}`
  );
}
