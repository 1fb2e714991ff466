import type { RuleResult, RuleUnit } from "../verdicts/verdict-schema";

/**
 * A rule result that has no measurement to judge: still waiting for readings or declarations,
 * or not applicable to this car (no wing fitted).
 */
export function pendingRuleResult(args: {
  ruleId: RuleResult["ruleId"];
  classId: string | null;
  unit: RuleUnit;
  onFail: RuleResult["onFail"];
  outcome: "waiting" | "not-applicable";
  decisionRule: RuleResult["decisionRule"];
  missing?: string[];
  reason: string;
}): RuleResult {
  return {
    ruleId: args.ruleId,
    classId: args.classId,
    unit: args.unit,
    reading: null,
    limit: null,
    marginToLimit: null,
    decisionRule: args.decisionRule,
    coverageFactorK: null,
    conformanceProbability: null,
    outcome: args.outcome,
    onFail: args.onFail,
    missing: args.missing ?? [],
    marginText: null,
    reason: args.reason,
  };
}
