import { isoDateFromParts } from "./iso-date-parts";

/**
 * The last calendar day of a month as ISO "YYYY-MM-DD", e.g. (2018, 2) → "2018-02-28".
 * @param month 1–12
 */
export function endOfMonthDate(year: number, month: number): string {
  // Day 0 of the next month is the last day of this one.
  const day = new Date(Date.UTC(year, month, 0)).getUTCDate();
  return isoDateFromParts({ year, month, day });
}
