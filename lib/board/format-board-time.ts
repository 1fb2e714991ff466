const formatters = new Map<string, Intl.DateTimeFormat>();

/**
 * An instant as the venue's wall-clock time, 24-hour ("09:40"), as the run sheet prints it.
 * Pure: the instant is a parameter.
 * @param iso a UTC ISO instant
 * @param timeZone the event's IANA zone
 */
export function formatBoardTime(iso: string, timeZone: string): string {
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
  const instant = new Date(iso);
  return Number.isNaN(instant.getTime()) ? "--:--" : f.format(instant);
}

/** A session's span in the venue's time ("09:40–10:00"). */
export function formatBoardSpan(startIso: string, endIso: string, timeZone: string): string {
  return `${formatBoardTime(startIso, timeZone)}–${formatBoardTime(endIso, timeZone)}`;
}
