/**
 * How many cars are in each class, in the class ladder's order (low → high, as the rule set lists
 * its classes), every class of the ladder included even at 0. A name the ladder does not know
 * (not expected) goes after the ladder, alphabetically, rather than being dropped.
 * @param classNames one class name per car
 * @param ladder the event's class names, lowest first
 */
export function tallyByLadder(
  classNames: readonly string[],
  ladder: readonly string[],
): { name: string; count: number }[] {
  const counts = new Map<string, number>(ladder.map((name) => [name, 0]));
  for (const name of classNames) counts.set(name, (counts.get(name) ?? 0) + 1);
  const extra = [...counts.keys()].filter((name) => !ladder.includes(name)).sort();
  return [...ladder, ...extra].map((name) => ({ name, count: counts.get(name) ?? 0 }));
}
