import { combineLinear } from "./combine-linear";
import type { DisplayUnits } from "./display-units";
import { formatQuantity } from "./format-quantity";
import { judgeMeasurand } from "./judge-measurand";
import { pendingRuleResult } from "./pending-rule-result";
import type { RuleSet } from "./rule-set-schema";
import type { DimensionMap } from "./summarise-dimensions";
import type { RuleResult } from "./verdict-schema";

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
