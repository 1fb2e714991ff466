import type { DecisionRule } from "../rule-sets/rule-set-schema";
import type { DisplayUnits } from "../units/display-units";
import { formatQuantity } from "../units/format-quantity";
import type { RuleResult, RuleUnit } from "../verdicts/verdict-schema";
import type { Measurand } from "./combine-linear";
import { decideLimit } from "./decide-limit";
import { describeMargin } from "./describe-margin";

/**
 * Judges a measured quantity against one limit and words the result:
 * "Wing top 205 mm above the roof; limit 203.2 mm; over by 1.8 mm". The walk of the class
 * ladder later adds what follows ("— moves up to Merlin.").
 * @param subject builds the opening words around the formatted value
 * @param limitText replaces the formatted limit (e.g. "body width + 0 mm")
 */
export function judgeMeasurand(args: {
  ruleId: RuleResult["ruleId"];
  classId: string | null;
  unit: RuleUnit;
  onFail: RuleResult["onFail"];
  measurand: Measurand;
  limit: number;
  side: "max" | "min";
  decisionRule: DecisionRule;
  display: DisplayUnits;
  subject: (valueText: string) => string;
  limitText?: string;
}): RuleResult {
  const { measurand, limit, side, decisionRule, unit, display } = args;
  const decision = decideLimit({
    value: measurand.value,
    standardUncertainty: measurand.standardUncertainty,
    limit,
    side,
    decisionRule,
  });
  const guarded = decisionRule.kind === "guarded";
  const valueText = formatQuantity(
    measurand.value,
    unit,
    display,
    guarded ? decision.expandedUncertainty : undefined,
  );
  const marginText = describeMargin({
    outcome: decision.outcome,
    marginToLimit: decision.marginToLimit,
    side,
    unit,
    display,
    expandedUncertainty: decision.expandedUncertainty,
  });
  const limitWord = side === "max" ? "limit" : "minimum";
  const limitText = args.limitText ?? formatQuantity(limit, unit, display);
  return {
    ruleId: args.ruleId,
    classId: args.classId,
    unit,
    reading: {
      value: measurand.value,
      standardUncertainty: measurand.standardUncertainty,
      expandedUncertainty: decision.expandedUncertainty,
      parts: measurand.parts,
    },
    limit: { value: limit, side },
    marginToLimit: decision.marginToLimit,
    decisionRule: decisionRule.kind,
    coverageFactorK: decisionRule.k,
    conformanceProbability: decision.conformanceProbability,
    outcome: decision.outcome,
    onFail: args.onFail,
    missing: [],
    marginText,
    reason: `${args.subject(valueText)}; ${limitWord} ${limitText}; ${marginText}`,
  };
}
