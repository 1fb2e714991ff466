/** An event's calendar date for people ("Sat 12 Jun 2027"); the date is the venue's own. Pure. */
export function formatEventDate(isoDate: string): string {
  return new Intl.DateTimeFormat("en-GB", {
    timeZone: "UTC",
    weekday: "short",
    day: "numeric",
    month: "short",
    year: "numeric",
  }).format(new Date(`${isoDate}T12:00:00Z`));
}
