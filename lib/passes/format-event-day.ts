/**
 * An event's calendar date for people, e.g. "Saturday 17 April 2027". The date is already the
 * venue's, so it is formatted without shifting zones.
 * @param isoDate "YYYY-MM-DD"
 */
export function formatEventDay(isoDate: string): string {
  const [y, m, d] = isoDate.split("-").map(Number);
  return new Intl.DateTimeFormat("en-GB", {
    weekday: "long",
    day: "numeric",
    month: "long",
    year: "numeric",
    timeZone: "UTC",
  }).format(new Date(Date.UTC(y ?? 1970, (m ?? 1) - 1, d ?? 1)));
}
