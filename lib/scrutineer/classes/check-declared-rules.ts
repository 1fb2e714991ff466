import { judgeMeasurand } from "../measurement/judge-measurand";
import type { ClassCheckContext } from "../power-to-weight/class-check-context";
import type { ClassRuleId } from "../rule-sets/rule-ids";
import { formatDecimal } from "../units/format-decimal";
import { formatQuantity } from "../units/format-quantity";
import type { RuleResult, RuleUnit } from "../verdicts/verdict-schema";
import type { ClassRules } from "./class-rules-schema";
import { pendingRuleResult } from "./pending-rule-result";

/**
 * Checks the limits a class sets on what the entrant declares: tyre treadwear floor (a tyre
 * without a grade fails any floor), modification points budget, and displacement after the
 * forced-induction multiplier. Declared values carry no uncertainty.
 */
export function checkDeclaredRules(cls: ClassRules, ctx: ClassCheckContext): RuleResult[] {
  const out: RuleResult[] = [];
  const d = ctx.declarations;
  const onFail = (id: ClassRuleId) => ctx.ruleSet.onViolation[id] ?? "move-up";
  const declared = (
    id: ClassRuleId,
    unit: RuleUnit,
    value: number,
    limit: number,
    side: "max" | "min",
    subject: string,
  ): RuleResult => ({
    ...judgeMeasurand({
      ruleId: id,
      classId: cls.id,
      unit,
      onFail: onFail(id),
      measurand: { value, standardUncertainty: 0, parts: [] },
      limit,
      side,
      decisionRule: { kind: "simple", k: ctx.ruleSet.decisionRule.k },
      display: ctx.display,
      subject: () => subject,
    }),
    decisionRule: "declared",
    coverageFactorK: null,
  });
  const waiting = (id: ClassRuleId, unit: RuleUnit, what: string) =>
    pendingRuleResult({
      ruleId: id,
      classId: cls.id,
      unit,
      onFail: onFail(id),
      outcome: "waiting",
      decisionRule: "declared",
      missing: [what],
      reason: `${what[0]?.toUpperCase() ?? ""}${what.slice(1)}: not declared yet`,
    });

  if (cls.minTreadwear !== null) {
    const tyres = d.tyres;
    if (tyres === null) out.push(waiting("tyre-treadwear", "treadwear", "tyre treadwear"));
    else if (tyres.kind === "no-grade") {
      out.push({
        ...pendingRuleResult({
          ruleId: "tyre-treadwear",
          classId: cls.id,
          unit: "treadwear",
          onFail: onFail("tyre-treadwear"),
          outcome: "waiting",
          decisionRule: "declared",
          reason:
            cls.minTreadwear > 0
              ? `Tyres carry no treadwear grade; ${cls.name} needs a treadwear grade of at least ${cls.minTreadwear}`
              : `Tyres carry no treadwear grade; ${cls.name} needs tyres with a treadwear grade`,
        }),
        outcome: "fail",
        limit: { value: cls.minTreadwear, side: "min" },
      });
    } else {
      out.push(
        declared(
          "tyre-treadwear",
          "treadwear",
          tyres.treadwear,
          cls.minTreadwear,
          "min",
          `Tyre treadwear ${tyres.treadwear}`,
        ),
      );
    }
  }

  if (cls.maxModificationPoints !== null) {
    if (d.modificationPoints === null)
      out.push(waiting("modification-points", "points", "modification points"));
    else {
      out.push(
        declared(
          "modification-points",
          "points",
          d.modificationPoints,
          cls.maxModificationPoints,
          "max",
          `${formatQuantity(d.modificationPoints, "points", ctx.display)} of modifications declared`,
        ),
      );
    }
  }

  if (cls.maxEffectiveDisplacementCc !== null) {
    const engine = d.engine;
    if (engine === null) out.push(waiting("displacement", "cc", "engine displacement"));
    else {
      const multiplier = engine.forcedInduction ? (ctx.ruleSet.forcedInductionMultiplier ?? 1) : 1;
      const effective = engine.displacementCc * multiplier;
      const subject =
        multiplier === 1
          ? `Displacement ${formatQuantity(effective, "cc", ctx.display)}`
          : `Displacement ${formatQuantity(engine.displacementCc, "cc", ctx.display)} × ${formatDecimal(multiplier, 3)} for forced induction = ${formatQuantity(effective, "cc", ctx.display)}`;
      out.push(
        declared("displacement", "cc", effective, cls.maxEffectiveDisplacementCc, "max", subject),
      );
    }
  }
  return out;
}
