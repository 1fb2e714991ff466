import type { ClassRules } from "../classes/class-rules-schema";
import { pendingRuleResult } from "../classes/pending-rule-result";
import { judgeMeasurand } from "../measurement/judge-measurand";
import { formatQuantity } from "../units/format-quantity";
import type { RuleResult } from "../verdicts/verdict-schema";
import type { ClassCheckContext } from "./class-check-context";

/**
 * Checks a class's minimum power-to-weight (mass per power: a car below the minimum is too
 * quick for the class). Null when the class sets no minimum.
 */
export function checkPowerToWeight(cls: ClassRules, ctx: ClassCheckContext): RuleResult | null {
  const rule = ctx.ruleSet.powerToWeight;
  if (cls.minPowerToWeight === null || rule === null) return null;
  const onFail = ctx.ruleSet.onViolation["power-to-weight"] ?? "move-up";
  const figure = ctx.powerToWeight;
  if (figure === null || !figure.ok) {
    return pendingRuleResult({
      ruleId: "power-to-weight",
      classId: cls.id,
      unit: rule.unit,
      onFail,
      outcome: "waiting",
      decisionRule: ctx.ruleSet.decisionRule.kind,
      missing: figure?.missing ?? [],
      reason: `Power-to-weight: ${figure?.reason ?? "not computed"}`,
    });
  }
  const guarded = ctx.ruleSet.decisionRule.kind === "guarded";
  const u = ctx.ruleSet.decisionRule.k * figure.measurand.standardUncertainty;
  return judgeMeasurand({
    ruleId: "power-to-weight",
    classId: cls.id,
    unit: rule.unit,
    onFail,
    measurand: figure.measurand,
    limit: cls.minPowerToWeight,
    side: "min",
    decisionRule: ctx.ruleSet.decisionRule,
    display: ctx.display,
    subject: () =>
      `Power-to-weight ${formatQuantity(figure.measurand.value, rule.unit, ctx.display, guarded ? u : undefined)} (${figure.description})`,
  });
}
