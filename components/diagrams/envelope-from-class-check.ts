import type { ClassRules } from "@/lib/scrutineer/classes/class-rules-schema";
import type { LengthDimension } from "@/lib/scrutineer/records/record-schema";
import type { ClassRuleId } from "@/lib/scrutineer/rule-sets/rule-ids";
import type { DisplayLengthUnit } from "@/lib/scrutineer/units/format-length";
import type {
  ClassCheck,
  DimensionSummary,
  RuleResult,
} from "@/lib/scrutineer/verdicts/verdict-schema";
import type { ClassEnvelopeProps, EnvelopeCheck } from "./envelope/envelope-types";

/**
 * ClassEnvelope's props from one class check of a Verdict: outcomes, readings, margins and
 * uncertainties from the check's wing rules, widths from the verdict's dimensions, limits from
 * the class's wing rules (a rule still waiting carries no limit of its own). Returns null when
 * there is no envelope to draw: the class allows no wing, or the car has none fitted.
 * Nothing is judged here; every outcome is the engine's.
 */
export function envelopeFromClassCheck(args: {
  check: ClassCheck;
  dimensions: ReadonlyArray<DimensionSummary>;
  unit: DisplayLengthUnit;
  wing: ClassRules["aero"]["wing"];
}): ClassEnvelopeProps | null {
  const { check, dimensions, unit, wing } = args;
  if (!wing.allowed) return null;
  const rule = (id: ClassRuleId): RuleResult | undefined =>
    check.rules.find((r) => r.ruleId === id);
  const wingRules = check.rules.filter((r) => r.ruleId.startsWith("wing-"));
  if (wingRules.some((r) => r.outcome === "not-applicable")) return null;

  const mean = (d: LengthDimension): number | null =>
    dimensions.find((s) => s.dimension === d && s.corner === null)?.mean ?? null;
  const difference = (a: number | null, b: number | null) =>
    a === null || b === null ? null : a - b;

  const fromRule = (
    id: ClassRuleId,
    limitMm: number | null,
    // Where the class sets no limit there is no rule result; the wing is still drawn at its
    // readings, which nothing judges.
    unjudgedMm: number | null,
  ): EnvelopeCheck => {
    const r = rule(id);
    if (limitMm === null || r === undefined) {
      return { limitMm, measuredMm: unjudgedMm, outcome: "waiting" };
    }
    return {
      limitMm,
      measuredMm: r.reading?.value ?? null,
      outcome: r.outcome === "not-applicable" ? "waiting" : r.outcome,
      marginText: r.marginText,
      uncertaintyMm: r.reading?.expandedUncertainty ?? null,
    };
  };

  const reference = wing.height?.reference ?? "roof-peak";
  const wingTop = mean("wingTopFromGroundMm");
  const plates = wing.span?.endPlatesCounted ?? true;
  const span = mean("wingSpanMm");
  const body = mean("bodyWidthMm");
  const plate = mean("endPlateThicknessMm");
  const spanCompared = plates ? span : span === null || plate === null ? null : span - 2 * plate;
  return {
    classLabel: check.className,
    unit,
    height: {
      reference,
      ...fromRule(
        "wing-height",
        wing.height?.maxMm ?? null,
        reference === "ground" ? wingTop : difference(wingTop, mean("roofPeakFromGroundMm")),
      ),
    },
    overhang: fromRule("wing-overhang", wing.maxOverhangMm, mean("wingOverhangMm")),
    span: {
      wingSpanMm: span,
      bodyWidthMm: body,
      endPlatesCounted: plates,
      ...fromRule(
        "wing-span",
        wing.span?.allowanceOverBodyMm ?? null,
        difference(spanCompared, body),
      ),
    },
    chord: fromRule("wing-chord", wing.maxChordMm, mean("wingChordMm")),
  };
}
