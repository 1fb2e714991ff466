import { isoDateParts } from "./iso-date-parts";

const MS_PER_DAY = 86_400_000;

function dayNumber(isoDate: string): number {
  const { year, month, day } = isoDateParts(isoDate);
  return Date.UTC(year, month - 1, day) / MS_PER_DAY;
}

/**
 * Whole calendar days from `fromDate` to `toDate` (both ISO "YYYY-MM-DD"); negative when
 * `toDate` is earlier. Pure calendar arithmetic: no clock, no time zone.
 */
export function daysBetweenDates(fromDate: string, toDate: string): number {
  return dayNumber(toDate) - dayNumber(fromDate);
}
