/** Year, month (1–12) and day of an ISO calendar date. */
export type IsoDateParts = { year: number; month: number; day: number };

/**
 * Splits an ISO calendar date "YYYY-MM-DD" into numbers; throws on anything else, because
 * dates reach the engine already validated by the schemas.
 */
export function isoDateParts(isoDate: string): IsoDateParts {
  const m = /^(\d{4})-(\d{2})-(\d{2})$/.exec(isoDate);
  if (m?.[1] === undefined || m[2] === undefined || m[3] === undefined) {
    throw new RangeError(`Not an ISO calendar date: "${isoDate}"`);
  }
  return { year: Number(m[1]), month: Number(m[2]), day: Number(m[3]) };
}

/** Formats year, month and day as "YYYY-MM-DD". */
export function isoDateFromParts({ year, month, day }: IsoDateParts): string {
  const pad = (n: number, w: number) => String(n).padStart(w, "0");
  return `${pad(year, 4)}-${pad(month, 2)}-${pad(day, 2)}`;
}
