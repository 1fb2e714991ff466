const formatters = new Map<string, Intl.DateTimeFormat>();

function formatterFor(timeZone: string): Intl.DateTimeFormat {
  let f = formatters.get(timeZone);
  if (!f) {
    f = new Intl.DateTimeFormat("en-GB", {
      timeZone,
      weekday: "short",
      day: "numeric",
      month: "short",
      hour: "2-digit",
      minute: "2-digit",
      hourCycle: "h23",
    });
    formatters.set(timeZone, f);
  }
  return f;
}

/**
 * Who recorded something and when, for people: "Helen Marsh at 10:42 on Sat 16 May". The time
 * is the recording device's clock, shown in the event's time zone. Pure: the instant is a
 * parameter.
 * @param name the official's name (null when they are no longer on the event's list)
 * @param deviceTime ISO 8601 with offset
 * @param timeZone the event's IANA zone
 */
export function formatWhoAndWhen(args: {
  name: string | null;
  deviceTime: string;
  timeZone: string;
}): string {
  const who = args.name ?? "an official no longer listed for this event";
  const instant = new Date(args.deviceTime);
  if (Number.isNaN(instant.getTime())) return who;
  const parts = Object.fromEntries(
    formatterFor(args.timeZone)
      .formatToParts(instant)
      .map((p) => [p.type, p.value]),
  );
  return `${who} at ${parts.hour}:${parts.minute} on ${parts.weekday} ${parts.day} ${parts.month}`;
}
