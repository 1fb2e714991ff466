const formatters = new Map<string, Intl.DateTimeFormat>();

/**
 * An instant as the venue's time of day, "09:30" (24-hour), in the event's IANA zone with its
 * daylight-saving rules (the tz database through Intl). Pure: the instant is a parameter.
 * @param iso an ISO 8601 instant with its offset
 * @param timeZone the event's IANA zone
 * @returns "" when the instant does not read
 */
export function formatLocalTime(iso: string, timeZone: string): string {
  const instant = new Date(iso);
  if (Number.isNaN(instant.getTime())) return "";
  let f = formatters.get(timeZone);
  if (!f) {
    f = new Intl.DateTimeFormat("en-GB", {
      timeZone,
      hour: "2-digit",
      minute: "2-digit",
      hourCycle: "h23",
    });
    formatters.set(timeZone, f);
  }
  return f.format(instant);
}
