/** The lowest car number an event hands out (1 is kept back: common practice (no source)). */
export const FIRST_CAR_NUMBER = 2;

/**
 * The car number a new entry gets: the lowest number ≥ 2 that no entry of the event holds.
 * `taken` must include withdrawn entries' numbers, so a number is never handed out twice in one
 * event (a printed pass or run sheet may still carry it).
 */
export function chooseCarNumber(taken: Iterable<number>): number {
  const used = new Set(taken);
  let n = FIRST_CAR_NUMBER;
  while (used.has(n)) n += 1;
  return n;
}
