/**
 * A pass time for people: weekday, date and 24-hour time at the venue with the zone's short
 * name, e.g. "Sun 18 Apr 2027, 02:00 BST". Pure: the instant is a parameter.
 * @param epochSeconds NumericDate seconds
 * @param timeZone the event's IANA zone
 */
export function formatPassTime(epochSeconds: number, timeZone: string): string {
  return new Intl.DateTimeFormat("en-GB", {
    timeZone,
    weekday: "short",
    day: "numeric",
    month: "short",
    year: "numeric",
    hour: "2-digit",
    minute: "2-digit",
    hourCycle: "h23",
    timeZoneName: "short",
  }).format(new Date(epochSeconds * 1000));
}
