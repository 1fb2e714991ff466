/** When a run sheet was published, in the venue's time ("Sat 27 Mar, 08:12"). Pure. */
export function formatPublishedAt(iso: string, timeZone: string): string {
  return new Intl.DateTimeFormat("en-GB", {
    timeZone,
    weekday: "short",
    day: "numeric",
    month: "short",
    hour: "2-digit",
    minute: "2-digit",
    hourCycle: "h23",
  }).format(new Date(iso));
}
