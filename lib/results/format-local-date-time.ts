const formatters = new Map<string, Intl.DateTimeFormat>();

function formatterFor(timeZone: string): Intl.DateTimeFormat {
  let f = formatters.get(timeZone);
  if (!f) {
    f = new Intl.DateTimeFormat("en-GB", {
      timeZone,
      year: "numeric",
      month: "2-digit",
      day: "2-digit",
      hour: "2-digit",
      minute: "2-digit",
      hourCycle: "h23",
    });
    formatters.set(timeZone, f);
  }
  return f;
}

/**
 * An instant as the venue's wall-clock date and time, "2031-05-17 14:32" (ISO 8601 order, so a
 * spreadsheet sorts it), in the event's IANA zone with its daylight-saving rules (the tz database
 * through Intl). Pure: the instant is a parameter.
 * @param iso an ISO 8601 instant with its offset
 * @param timeZone the event's IANA zone, e.g. "Europe/London"
 * @returns "" when the instant does not read
 */
export function formatLocalDateTime(iso: string, timeZone: string): string {
  const instant = new Date(iso);
  if (Number.isNaN(instant.getTime())) return "";
  const p = Object.fromEntries(
    formatterFor(timeZone)
      .formatToParts(instant)
      .map((part) => [part.type, part.value]),
  );
  return `${p.year}-${p.month}-${p.day} ${p.hour}:${p.minute}`;
}
