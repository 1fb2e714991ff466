/**
 * The calendar date at an instant in an IANA time zone, as ISO "YYYY-MM-DD" — for callers that
 * hold a clock reading and need the event-local date the engine takes (e.g. the venue's
 * "Europe/London"). Pure: the instant is a parameter.
 * @param instant an ISO date-time string with offset, or milliseconds since the Unix epoch
 * @param timeZone an IANA zone name; throws RangeError when the runtime does not know it
 */
export function localDateInZone(instant: string | number, timeZone: string): string {
  const date = new Date(instant);
  if (Number.isNaN(date.getTime())) throw new RangeError(`Not an instant: "${String(instant)}"`);
  const parts = new Intl.DateTimeFormat("en-CA", {
    timeZone,
    year: "numeric",
    month: "2-digit",
    day: "2-digit",
  }).formatToParts(date);
  const get = (type: "year" | "month" | "day") => parts.find((p) => p.type === type)?.value ?? "";
  return `${get("year").padStart(4, "0")}-${get("month")}-${get("day")}`;
}
