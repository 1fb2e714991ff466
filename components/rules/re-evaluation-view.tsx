import type { RuleSetChangePreview } from "@/lib/rule-sets/preview-rule-set-change";
import { verdictLabels } from "@/lib/verdict-word";

function formatValue(value: unknown): string {
  if (value === undefined) return "(none)";
  const text = JSON.stringify(value);
  return text.length > 80 ? `${text.slice(0, 77)}…` : text;
}

/** What a rule-set version changes: the values that differ and every verdict that would move. */
export function ReEvaluationView({ preview }: { preview: RuleSetChangePreview }) {
  const name = (id: string | null) => (id === null ? "" : (preview.classNames[id] ?? id));
  const word = (v: { status: keyof typeof verdictLabels; classId: string | null }) =>
    v.classId === null
      ? verdictLabels[v.status]
      : `${verdictLabels[v.status]} (${name(v.classId)})`;
  return (
    <section className="space-y-3" data-testid="re-evaluation">
      <h3 className="text-xl font-bold">
        Version {preview.fromVersion} → {preview.toVersion}: {preview.changed.length}{" "}
        {preview.changed.length === 1 ? "verdict changes" : "verdicts change"},{" "}
        {preview.unchangedCount} unchanged
      </h3>
      <details className="card">
        <summary className="min-h-touch cursor-pointer py-2 font-semibold">
          {preview.ruleSetChanges.length} {preview.ruleSetChanges.length === 1 ? "value" : "values"}{" "}
          changed in the rule set
        </summary>
        <ul className="space-y-1 font-mono text-base">
          {preview.ruleSetChanges.map((c) => (
            <li key={c.path} className="break-words">
              {c.path}: {formatValue(c.before)} → {formatValue(c.after)}
            </li>
          ))}
        </ul>
      </details>
      {preview.problems.length > 0 ? (
        <ul className="card space-y-1 border-stopped-line" role="alert">
          {preview.problems.map((p) => (
            <li key={p.entryId} className="text-stopped">
              Car {preview.carNumbers[p.entryId] ?? "?"}: {p.message}
            </li>
          ))}
        </ul>
      ) : null}
      {preview.changed.length > 0 ? (
        <ul className="card divide-y divide-asphalt-200">
          {preview.changed.map((c) => (
            <li key={c.entryId} className="space-y-1 py-3">
              <p className="text-lg font-semibold">
                Car <span className="tabular">{preview.carNumbers[c.entryId] ?? "?"}</span>:{" "}
                {word(c.before)} → {word(c.after)}
              </p>
              <p className="text-base">{c.after.reason}</p>
              {c.why.length > 0 ? (
                <ul className="list-disc pl-6 text-base text-asphalt-800">
                  {c.why.map((line) => (
                    <li key={line}>{line}</li>
                  ))}
                </ul>
              ) : null}
            </li>
          ))}
        </ul>
      ) : null}
    </section>
  );
}
