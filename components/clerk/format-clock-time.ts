/** A UTC instant as the venue's 24-hour wall-clock time ("09:30"), in the event's time zone. */
export function formatClockTime(iso: string, timeZone: string): string {
  return new Intl.DateTimeFormat("en-GB", {
    timeZone,
    hour: "2-digit",
    minute: "2-digit",
    hourCycle: "h23",
  }).format(new Date(iso));
}
