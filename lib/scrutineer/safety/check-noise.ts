import { pendingRuleResult } from "../classes/pending-rule-result";
import { combineLinear } from "../measurement/combine-linear";
import { judgeMeasurand } from "../measurement/judge-measurand";
import type { DimensionMap } from "../measurement/summarise-dimensions";
import type { RuleSet } from "../rule-sets/rule-set-schema";
import type { DisplayUnits } from "../units/display-units";
import { formatQuantity } from "../units/format-quantity";
import type { RuleResult } from "../verdicts/verdict-schema";

/**
 * Checks the event's static noise limit, if the rule set has one. A car over it is held
 * (fix and re-present), whatever its class.
 */
export function checkNoise(
  ruleSet: RuleSet,
  dimensions: DimensionMap,
  display: DisplayUnits,
): RuleResult[] {
  const noise = ruleSet.noise;
  if (noise === null) return [];
  const summary = dimensions.get("noiseDbA");
  if (summary === undefined) {
    return [
      pendingRuleResult({
        ruleId: "noise",
        classId: null,
        unit: "dB(A)",
        onFail: "stop",
        outcome: "waiting",
        decisionRule: ruleSet.decisionRule.kind,
        missing: ["noise"],
        reason: `Noise: waiting for the static test (${noise.method})`,
      }),
    ];
  }
  const measurand = combineLinear([{ coefficient: 1, summary }]);
  const guarded = ruleSet.decisionRule.kind === "guarded";
  const u = ruleSet.decisionRule.k * measurand.standardUncertainty;
  return [
    judgeMeasurand({
      ruleId: "noise",
      classId: null,
      unit: "dB(A)",
      onFail: "stop",
      measurand,
      limit: noise.maxDbA,
      side: "max",
      decisionRule: ruleSet.decisionRule,
      display,
      subject: () =>
        `Noise ${formatQuantity(measurand.value, "dB(A)", display, guarded ? u : undefined)}`,
    }),
  ];
}
