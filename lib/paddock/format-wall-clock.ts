const formatters = new Map<string, Intl.DateTimeFormat>();

/**
 * An instant as the venue's wall clock, 24-hour ("09:05"), from the tz database through Intl; the
 * one formatter the clerk's page, the board, print and e-mail share. "--:--" for a time that does
 * not read. Pure.
 * @param iso ISO 8601 instant
 * @param timeZone the event's IANA zone
 */
export function formatWallClock(iso: string, timeZone: string): string {
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

/** A span of time as the venue's wall clock ("09:05–09:25"). Pure. */
export function formatWallClockSpan(startIso: string, endIso: string, timeZone: string): string {
  return `${formatWallClock(startIso, timeZone)}–${formatWallClock(endIso, timeZone)}`;
}
