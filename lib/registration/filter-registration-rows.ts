import type { RegistrationRow } from "./registration-row";

/**
 * The rows a search finds. Car number first: digits match car numbers that start with them
 * ("1" → 1, 10–19, 100…); anything else matches drivers' names, the car or the class, ignoring
 * case and accents. An empty search finds every row.
 */
export function filterRegistrationRows(
  rows: readonly RegistrationRow[],
  query: string,
): RegistrationRow[] {
  const q = fold(query.trim());
  if (!q) return [...rows];
  if (/^\d+$/.test(q)) return rows.filter((r) => String(r.carNumber).startsWith(q));
  return rows.filter((r) => fold(`${r.drivers} ${r.car} ${r.declaredClass}`).includes(q));
}

function fold(text: string): string {
  return text
    .normalize("NFD")
    .replace(/\p{Diacritic}/gu, "")
    .toLowerCase();
}
