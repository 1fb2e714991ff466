/** How many cars are in each class, as a row of chips ("Merlin: 15"). */
export function ClassTally({ classNames, testId }: { classNames: string[]; testId?: string }) {
  const counts = new Map<string, number>();
  for (const name of classNames) counts.set(name, (counts.get(name) ?? 0) + 1);
  return (
    <ul className="flex flex-wrap gap-2" data-testid={testId}>
      {[...counts.entries()].map(([name, count]) => (
        <li key={name} className="rounded-full border-2 border-asphalt-700 px-3 py-1 font-semibold">
          {name}: <span className="tabular">{count}</span>
        </li>
      ))}
    </ul>
  );
}
