const formatters = new Map<string, Intl.DateTimeFormat>();

/**
 * A record's time of day to the second in the event's time zone ("10:42:07"), enough to tell
 * repeated readings apart on the day. Pure: the instant is a parameter.
 * @param iso ISO 8601 with offset (a record's device time)
 * @param timeZone the event's IANA zone
 */
export function formatClockTime(iso: string, timeZone: string): string {
  let f = formatters.get(timeZone);
  if (!f) {
    f = new Intl.DateTimeFormat("en-GB", {
      timeZone,
      hour: "2-digit",
      minute: "2-digit",
      second: "2-digit",
      hourCycle: "h23",
    });
    formatters.set(timeZone, f);
  }
  const instant = new Date(iso);
  return Number.isNaN(instant.getTime()) ? "unknown time" : f.format(instant);
}
