import { ClassEnvelope } from "@/components/diagrams/class-envelope";
import { envelopeFromClassCheck } from "@/components/diagrams/envelope-from-class-check";
import {
  type ClassFit,
  type PlannedLimit,
  plannedLimitTitle,
} from "@/lib/scrutineer/aero/precheck-wing-plan";
import type { ClassRules } from "@/lib/scrutineer/classes/class-rules-schema";
import { formatDecimal } from "@/lib/scrutineer/units/format-decimal";
import { DISPLAY_DECIMALS } from "@/lib/scrutineer/units/format-length";
import type { DimensionSummary } from "@/lib/scrutineer/verdicts/verdict-schema";
import { EnvelopeTopView } from "./envelope-top-view";

function amount(value: number | null, unit: "mm" | "in", signed = false): string {
  if (value === null) return "—";
  const text = formatDecimal(Math.abs(value), DISPLAY_DECIMALS[unit]);
  const sign = !signed || Number(text) === 0 ? "" : value > 0 ? "+" : "−";
  return `${sign}${text} ${unit}`;
}

function LimitRow({ limit }: { limit: PlannedLimit }) {
  return (
    <li
      className="space-y-1 border-t border-asphalt-200 pt-2"
      data-testid="planned-limit"
      data-rule={limit.ruleId}
      data-fits={limit.fits}
      data-margin={limit.margin ?? ""}
    >
      <p className="flex flex-wrap items-baseline justify-between gap-2">
        <span className="text-lg font-semibold">{plannedLimitTitle(limit.ruleId)}</span>
        <span
          className={`tabular text-lg font-bold ${limit.fits ? "text-cleared" : "text-stopped"}`}
        >
          {limit.fits ? "✓ inside" : "✕ over"} · margin {amount(limit.margin, limit.unit, true)}
        </span>
      </p>
      {limit.planned !== null ? (
        <p className="tabular text-base text-asphalt-800">
          Planned {amount(limit.planned, limit.unit)} · limit {amount(limit.limit, limit.unit)}
        </p>
      ) : null}
      <p className="text-base">{limit.words}.</p>
    </li>
  );
}

/**
 * One class of the ladder against the planned wing: fits or over with its word and mark, each
 * wing limit with the planned value, the limit and the signed margin in the plan's units, and
 * the class envelope from the side, behind and above with the wing drawn in it.
 */
export function ClassFitCard({
  fit,
  cls,
  dimensions,
  unit,
}: {
  fit: ClassFit;
  cls: ClassRules;
  dimensions: ReadonlyArray<DimensionSummary>;
  unit: "mm" | "in";
}) {
  const envelope = envelopeFromClassCheck({
    check: fit.check,
    dimensions,
    unit,
    wing: cls.aero.wing,
  });
  return (
    <li
      className="card space-y-3"
      data-testid="class-fit"
      data-class-id={fit.classId}
      data-fits={fit.fits}
    >
      <div className="flex flex-wrap items-center justify-between gap-2">
        <h3 className="text-2xl font-bold">{fit.className}</h3>
        <span
          className={`rounded-full px-3 py-1 text-lg font-bold text-white ${fit.fits ? "bg-cleared" : "bg-stopped"}`}
          data-testid="class-fit-word"
        >
          {fit.fits ? "✓ Fits" : "✕ Over"}
        </span>
      </div>
      <p className="text-lg">{fit.words}</p>
      {fit.limits.length > 0 ? (
        <ul className="space-y-2">
          {fit.limits.map((l) => (
            <LimitRow key={l.ruleId} limit={l} />
          ))}
        </ul>
      ) : null}
      {envelope ? (
        <>
          <ClassEnvelope {...envelope} />
          <figure className="card" data-testid="class-envelope-top">
            <figcaption className="text-base text-asphalt-800">
              From above (not to scale): the allowed width and how far behind the bumper the wing
              may reach.
            </figcaption>
            <EnvelopeTopView
              span={envelope.span}
              overhang={envelope.overhang}
              unit={unit}
              label={`Top view of the ${fit.className} class envelope. Span: ${fit.limits.find((l) => l.ruleId === "wing-span")?.words ?? "no limit"}. Behind the bodywork: ${fit.limits.find((l) => l.ruleId === "wing-overhang")?.words ?? "no limit"}.`}
            />
          </figure>
        </>
      ) : null}
    </li>
  );
}
