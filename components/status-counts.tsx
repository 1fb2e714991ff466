import { type VerdictWord, verdictLabels, verdictWords } from "@/lib/verdict-word";

/** How many cars are in each verdict state, as a row of tallies. */
export function StatusCounts({ rows }: { rows: { status: VerdictWord }[] }) {
  const counts = new Map<VerdictWord, number>();
  for (const row of rows) counts.set(row.status, (counts.get(row.status) ?? 0) + 1);
  return (
    <dl className="grid grid-cols-3 gap-2 sm:grid-cols-5" data-testid="status-counts">
      {verdictWords.map((word) => (
        <div key={word} className="card p-3 text-center">
          <dt className="text-base font-semibold text-asphalt-800">{verdictLabels[word]}</dt>
          <dd className="tabular text-3xl font-bold" data-status={word}>
            {counts.get(word) ?? 0}
          </dd>
        </div>
      ))}
    </dl>
  );
}
