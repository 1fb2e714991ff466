import { isoDateParts } from "./iso-date-parts";

function isLeapYear(year: number): boolean {
  return (year % 4 === 0 && year % 100 !== 0) || year % 400 === 0;
}

/**
 * A person's age in whole years on a calendar date, from their date of birth (both ISO
 * "YYYY-MM-DD"). They are a year older from the start of each anniversary of their birth; someone
 * born on 29 February is a year older on 1 March in a common year (the usual reading in England
 * and Wales; other jurisdictions may say 28 February, and the sanctioning body's rulebook and local
 * law govern). A date before the birth gives a negative number.
 */
export function ageOnDate(dateOfBirth: string, onDate: string): number {
  const born = isoDateParts(dateOfBirth);
  const on = isoDateParts(onDate);
  const leapling = born.month === 2 && born.day === 29;
  const birthday =
    leapling && !isLeapYear(on.year) ? { month: 3, day: 1 } : { month: born.month, day: born.day };
  const beforeBirthday =
    on.month < birthday.month || (on.month === birthday.month && on.day < birthday.day);
  return on.year - born.year - (beforeBirthday ? 1 : 0);
}

/** Age of majority in England and Wales (Family Law Reform Act 1969 s.1). */
export const ADULT_AGE_YEARS = 18;

/** Under 18 on that date: a minor, whose waiver needs a parent or guardian too. */
export function isMinorOn(dateOfBirth: string, onDate: string): boolean {
  return ageOnDate(dateOfBirth, onDate) < ADULT_AGE_YEARS;
}
