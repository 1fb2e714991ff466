import { endOfMonthDate } from "./end-of-month-date";
import { isoDateFromParts, isoDateParts } from "./iso-date-parts";

/**
 * Adds whole years to an ISO date; 29 February lands on 28 February in a common year.
 * @returns ISO "YYYY-MM-DD"
 */
export function addYearsToDate(isoDate: string, years: number): string {
  const { year, month, day } = isoDateParts(isoDate);
  const lastDay = isoDateParts(endOfMonthDate(year + years, month)).day;
  return isoDateFromParts({ year: year + years, month, day: Math.min(day, lastDay) });
}
