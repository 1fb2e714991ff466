import { type VerdictWord, verdictLabels, verdictWords } from "@/lib/verdict-word";
import { verdictLook } from "./verdict-look";

/** How many cars are in each verdict state, as tiles: word + icon + colour, and the count. */
export function StatusCounts({ rows }: { rows: { status: VerdictWord }[] }) {
  const counts = new Map<VerdictWord, number>();
  for (const row of rows) counts.set(row.status, (counts.get(row.status) ?? 0) + 1);
  return (
    <dl className="grid grid-cols-2 gap-2 sm:grid-cols-5" data-testid="status-counts">
      {verdictWords.map((word) => (
        <div
          key={word}
          className={`rounded-xl border-2 p-3 ${verdictLook[word].className}`}
          data-testid="status-tile"
        >
          <dt className="flex items-center gap-1.5 whitespace-nowrap text-base font-semibold">
            {verdictLook[word].icon}
            {verdictLabels[word]}
          </dt>
          <dd className="tabular text-3xl font-bold" data-status={word}>
            {counts.get(word) ?? 0}
          </dd>
        </div>
      ))}
    </dl>
  );
}
