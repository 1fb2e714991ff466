import type { RuleSetDescription } from "@/lib/scrutineer/rule-sets/describe-rule-set";

/** The class ladder and the rules around it, in words, one card per class (low → high). */
export function RuleSetDescriptionView({ description }: { description: RuleSetDescription }) {
  return (
    <div className="space-y-4" data-testid="rule-set-description">
      <ol className="grid gap-4 lg:grid-cols-2">
        {description.classes.map((cls, index) => (
          <li key={cls.id} className="card space-y-2">
            <h3 className="text-xl font-bold">
              <span className="tabular text-asphalt-700">{index + 1}.</span> {cls.name}
            </h3>
            {cls.description ? (
              <p className="text-base text-asphalt-800">{cls.description}</p>
            ) : null}
            <dl className="space-y-1">
              {cls.lines.map((line) => (
                <div key={line.label}>
                  <dt className="text-base font-semibold text-asphalt-700">{line.label}</dt>
                  <dd className="text-base">{line.value}</dd>
                </div>
              ))}
            </dl>
          </li>
        ))}
      </ol>
      <dl className="card space-y-1">
        {description.general.map((line) => (
          <div key={line.label}>
            <dt className="text-base font-semibold text-asphalt-700">{line.label}</dt>
            <dd className="text-base">{line.value}</dd>
          </div>
        ))}
      </dl>
      {description.standards.length > 0 ? (
        <div className="card">
          <h3 className="text-xl font-bold">Safety standards accepted</h3>
          <ul className="divide-y divide-asphalt-200">
            {description.standards.map((s) => (
              <li key={s.name} className="py-2">
                <p className="font-semibold">
                  {s.name} <span className="font-normal text-asphalt-700">({s.item})</span>
                </p>
                <p className="text-base">{s.expiry}</p>
                {s.source ? <p className="text-base text-asphalt-700">Source: {s.source}</p> : null}
              </li>
            ))}
          </ul>
        </div>
      ) : null}
    </div>
  );
}
