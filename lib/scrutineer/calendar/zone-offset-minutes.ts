const formatters = new Map<string, Intl.DateTimeFormat>();

function formatterFor(timeZone: string): Intl.DateTimeFormat {
  let f = formatters.get(timeZone);
  if (f === undefined) {
    f = new Intl.DateTimeFormat("en-US", {
      timeZone,
      hourCycle: "h23",
      year: "numeric",
      month: "2-digit",
      day: "2-digit",
      hour: "2-digit",
      minute: "2-digit",
      second: "2-digit",
    });
    formatters.set(timeZone, f);
  }
  return f;
}

/**
 * The zone's offset from UTC at an instant, in minutes (east positive: +60 for British Summer
 * Time, −300 for US Eastern Standard Time), read from the runtime's copy of the IANA tz database
 * through Intl. Pure: the instant is a parameter. Meant for event days (years 1000–9999).
 * @param utcMs milliseconds since the Unix epoch
 * @param timeZone an IANA zone name; throws RangeError when the runtime does not know it
 */
export function zoneOffsetMinutes(utcMs: number, timeZone: string): number {
  if (!Number.isFinite(utcMs)) throw new RangeError(`Not an instant: ${String(utcMs)}`);
  const wholeSecond = Math.floor(utcMs / 1000) * 1000;
  const parts = formatterFor(timeZone).formatToParts(new Date(wholeSecond));
  const get = (type: Intl.DateTimeFormatPartTypes) =>
    Number(parts.find((p) => p.type === type)?.value ?? Number.NaN);
  const wallAsUtc = Date.UTC(
    get("year"),
    get("month") - 1,
    get("day"),
    get("hour"),
    get("minute"),
    get("second"),
  );
  return (wallAsUtc - wholeSecond) / 60_000;
}
