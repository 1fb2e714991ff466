import type { ClassRules } from "../classes/class-rules-schema";
import { entryDeclarationsSchema } from "../classes/entry-declarations-schema";
import type { ClassCheckContext } from "../power-to-weight/class-check-context";
import type { RuleSet } from "../rule-sets/rule-set-schema";
import { convertLength } from "../units/convert-length";
import { displayUnits } from "../units/display-units";
import type { ClassCheck, RuleResult } from "../verdicts/verdict-schema";
import { checkAeroRules } from "./check-aero-rules";
import { deriveAeroGeometry } from "./derive-aero-geometry";
import { wingPlanDimensionMap } from "./wing-plan-dimensions";
import type { PlanLengthUnit, WingPlan } from "./wing-plan-schema";

/** The wing rules a pre-check reports, in the order the drawings show them. */
export const PLANNED_WING_RULES = [
  "wing-allowed",
  "wing-height",
  "wing-overhang",
  "wing-span",
  "wing-chord",
] as const;
/** One of {@link PLANNED_WING_RULES}. */
export type PlannedWingRule = (typeof PLANNED_WING_RULES)[number];

/** One wing limit of a class against the plan, in the unit of the plan's own field. */
export type PlannedLimit = {
  ruleId: PlannedWingRule;
  /** The plan's unit for this limit (the span field's for the span, the chord's for the chord…). */
  unit: PlanLengthUnit;
  /** Planned quantity: the span itself (not span − body), height above the roof or the ground,
   * the signed overhang (+ behind), the chord; null for "no wing allowed". */
  planned: number | null;
  /** The class's limit on the same quantity (body width + allowance for the span). */
  limit: number | null;
  /** limit − planned: positive = room left, negative = over, 0 = exactly on the limit. */
  margin: number | null;
  fits: boolean;
  /** One sentence in the plan's unit: "Wing span 64.5 in, …; limit the body's width; over by 0.5 in". */
  words: string;
};

/** How a planned wing stands in one class of the ladder. */
export type ClassFit = {
  classId: string;
  className: string;
  fits: boolean;
  /** The class's wing limits (none when the class sets none). */
  limits: PlannedLimit[];
  /** One sentence for the class. */
  words: string;
  /** The engine's check of the plan in this class (wing rules only), for the envelope drawings. */
  check: ClassCheck;
};

const declarations = entryDeclarationsSchema.parse({ aero: { wing: true } });

function unitFor(ruleId: PlannedWingRule, plan: WingPlan): PlanLengthUnit {
  switch (ruleId) {
    case "wing-height":
      return plan.wing.height.unit;
    case "wing-overhang":
      return plan.wing.mount.distance.unit;
    case "wing-chord":
      return plan.wing.chord.unit;
    default:
      return plan.wing.span.kind === "whole" ? plan.wing.span.span.unit : plan.wing.span.half.unit;
  }
}

const TITLES: Record<PlannedWingRule, string> = {
  "wing-allowed": "Wing allowed",
  "wing-height": "Wing height",
  "wing-overhang": "Wing behind the bodywork",
  "wing-span": "Wing span",
  "wing-chord": "Wing chord",
};

/** A rule's title for lists ("Wing span"). */
export function plannedLimitTitle(ruleId: PlannedWingRule): string {
  return TITLES[ruleId];
}

const isPlanned = (r: RuleResult): r is RuleResult & { ruleId: PlannedWingRule } =>
  (PLANNED_WING_RULES as ReadonlyArray<string>).includes(r.ruleId);

function classWords(cls: ClassRules, limits: PlannedLimit[], fits: boolean): string {
  if (!cls.aero.wing.allowed) return `${cls.name} allows no wing.`;
  if (limits.length === 0) return `${cls.name} sets no wing limits: this wing fits.`;
  if (fits) {
    const closest = [...limits].sort((a, b) => (a.margin ?? 0) - (b.margin ?? 0))[0];
    return `Fits ${cls.name}${closest ? `; closest: ${closest.words}` : ""}.`;
  }
  const over = limits.filter((l) => !l.fits).map((l) => l.words);
  return `Over in ${cls.name}: ${over.join("; ")}.`;
}

/**
 * The aero pre-check: how a planned wing on a planned car stands in every class of the rule set,
 * in ladder order. The plan becomes exact "readings" judged by the engine's own geometry and
 * wing rules (deriveAeroGeometry, checkAeroRules), so the pre-check can never disagree with the
 * tech line about a limit; only the uncertainty differs: a plan is exact, so simple acceptance is
 * used whatever the rule set's decision rule (at the tech line a measured car near a limit may be
 * judged "too close to call"). Splitter and diffuser rules are left out: a wing plan has neither.
 */
export function precheckWingPlan({
  plan,
  ruleSet,
}: {
  plan: WingPlan;
  ruleSet: RuleSet;
}): ClassFit[] {
  const k = ruleSet.decisionRule.k;
  const dimensions = wingPlanDimensionMap(plan, k);
  const geometry = deriveAeroGeometry(dimensions);
  const planRules: RuleSet = { ...ruleSet, decisionRule: { kind: "simple", k } };
  const context = (length: PlanLengthUnit): ClassCheckContext => ({
    ruleSet: planRules,
    display: displayUnits({ length }),
    declarations,
    dimensions,
    geometry,
    hasWing: true,
    hasSplitter: false,
    powerToWeight: null,
  });
  const inMm = context("mm");
  const inIn = context("in");
  const bodyMm = dimensions.get("bodyWidthMm")?.mean ?? 0;

  return ruleSet.classes.map((cls) => {
    const byUnit = {
      mm: checkAeroRules(cls, inMm).filter(isPlanned),
      in: checkAeroRules(cls, inIn).filter(isPlanned),
    };
    const worded = byUnit.mm.map((r, i) =>
      unitFor(r.ruleId, plan) === "mm" ? r : (byUnit.in[i] ?? r),
    );
    const limits: PlannedLimit[] = byUnit.mm.map((r, i) => {
      const unit = unitFor(r.ruleId, plan);
      const show = (mm: number | null) => (mm === null ? null : convertLength(mm, "mm", unit));
      const offset = r.ruleId === "wing-span" ? bodyMm : 0;
      const reading = r.reading === null ? null : r.reading.value + offset;
      const limit = r.limit === null ? null : r.limit.value + offset;
      return {
        ruleId: r.ruleId,
        unit,
        planned: show(reading),
        limit: show(limit),
        margin: show(r.marginToLimit),
        fits: r.outcome === "pass",
        words:
          r.ruleId === "wing-allowed"
            ? `A wing is planned; ${cls.name} allows none`
            : (worded[i] ?? r).reason,
      };
    });
    const fits = limits.every((l) => l.fits);
    return {
      classId: cls.id,
      className: cls.name,
      fits,
      limits,
      words: classWords(cls, limits, fits),
      check: {
        classId: cls.id,
        className: cls.name,
        fit: fits ? "fits" : "over",
        // Each rule worded in its own field's unit (the drawings write its margin as given).
        rules: worded,
      },
    };
  });
}
