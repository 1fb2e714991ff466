// Private to the waiver until the accounts part's lib/scrutineer/calendar/age-on-date.ts
// (`isMinorOn`) is merged; the lead then points the imports there and removes this file.

const ISO_DATE = /^(\d{4})-(\d{2})-(\d{2})$/;

/**
 * True when a person born on `dateOfBirth` is under 18 on `date` (both ISO calendar dates,
 * YYYY-MM-DD). Whole years: the 18th birthday is the first day they are of age. Someone born on
 * 29 February comes of age on 1 March in a year with no 29 February — common practice (no source).
 * An unreadable date counts as not a minor (the profile form refuses those).
 */
export function isMinorOn(dateOfBirth: string, date: string): boolean {
  const b = ISO_DATE.exec(dateOfBirth);
  const d = ISO_DATE.exec(date);
  if (!b || !d) return false;
  const [by, bm, bd] = [Number(b[1]), Number(b[2]), Number(b[3])];
  const [dy, dm, dd] = [Number(d[1]), Number(d[2]), Number(d[3])];
  let age = dy - by;
  if (dm < bm || (dm === bm && dd < bd)) age -= 1;
  return age < 18;
}
