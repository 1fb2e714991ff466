const formatters = new Map<string, Intl.DateTimeFormat>();

function formatterFor(timeZone: string): Intl.DateTimeFormat {
  let f = formatters.get(timeZone);
  if (!f) {
    f = new Intl.DateTimeFormat("en-GB", {
      timeZone,
      weekday: "short",
      day: "numeric",
      month: "short",
      year: "numeric",
      hour: "2-digit",
      minute: "2-digit",
      hourCycle: "h23",
    });
    formatters.set(timeZone, f);
  }
  return f;
}

/**
 * When provisional results were issued, for people: "14:32 on Sat 17 May 2031 (Europe/London
 * time)". Results are issued as of the latest verdict, so this is that verdict's computing time
 * in the event's zone. Pure: the instant is a parameter.
 * @param issuedAt ISO 8601 instant, or null when no verdict exists yet
 * @param timeZone the event's IANA zone
 */
export function describeIssueTime(issuedAt: string | null, timeZone: string): string {
  if (issuedAt === null) return "no verdict computed yet";
  const instant = new Date(issuedAt);
  if (Number.isNaN(instant.getTime())) return "unknown time";
  const p = Object.fromEntries(
    formatterFor(timeZone)
      .formatToParts(instant)
      .map((part) => [part.type, part.value]),
  );
  return `${p.hour}:${p.minute} on ${p.weekday} ${p.day} ${p.month} ${p.year} (${timeZone} time)`;
}
