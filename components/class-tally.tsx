import { tallyByLadder } from "@/lib/entries/tally-by-ladder";

/** How many cars are in each class, as a row of chips ("Merlin: 15") in ladder order, low → high. */
export function ClassTally({
  classNames,
  ladder,
  testId,
}: {
  classNames: string[];
  /** The event's class names, lowest first (the rule set's order). */
  ladder: string[];
  testId?: string;
}) {
  return (
    <ul
      className="flex flex-wrap gap-2"
      data-testid={testId}
      aria-label="Cars by class, low to high"
    >
      {tallyByLadder(classNames, ladder).map(({ name, count }) => (
        <li
          key={name}
          className="rounded-full border-2 border-asphalt-700 px-3 py-1 font-semibold"
          data-class-name={name}
        >
          {name}: <span className="tabular">{count}</span>
        </li>
      ))}
    </ul>
  );
}
