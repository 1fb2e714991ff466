const formatters = new Map<string, Intl.DateTimeFormat>();

/** A session's start and end as the venue's wall clock ("09:10–09:30"). Pure. */
export function formatSessionSpan(
  session: { startsAt: string; endsAt: string },
  timeZone: string,
): string {
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
  return `${f.format(new Date(session.startsAt))}–${f.format(new Date(session.endsAt))}`;
}
