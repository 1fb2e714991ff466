import type { EnvelopeRow } from "./envelope-rows";
import { EnvelopeStatus } from "./envelope-status";

/** The envelope's numbers as text under the drawings: reading, state, limit and margin. */
export function EnvelopeReadout({ rows }: { rows: EnvelopeRow[] }) {
  return (
    <dl className="divide-y divide-asphalt-200" data-testid="envelope-readout">
      {rows.map((row) => (
        <div key={row.key} className="py-2" data-row={row.key} data-state={row.look.state}>
          <div className="flex flex-wrap items-center justify-between gap-2">
            <dt className="text-base font-semibold text-asphalt-800">{row.title}</dt>
            <dd>
              <EnvelopeStatus look={row.look} />
            </dd>
          </div>
          <dd className="tabular text-2xl font-semibold text-asphalt-950">{row.reading}</dd>
          <dd className="tabular text-base text-asphalt-800">
            {row.limit}
            {row.margin === row.look.word || row.margin === row.limit ? null : (
              <>
                {" · "}
                <strong className="font-semibold text-asphalt-950">{row.margin}</strong>
              </>
            )}
          </dd>
        </div>
      ))}
    </dl>
  );
}
