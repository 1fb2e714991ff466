import type { PowerToWeightFigure } from "./class-check-context";
import { convertMass } from "./convert-mass";
import { convertPower } from "./convert-power";
import { powerToWeightUnitParts } from "./convert-power-to-weight";
import { correctedPowerKw } from "./corrected-power-kw";
import type { DisplayUnits } from "./display-units";
import { CORRECTION_NAMES } from "./dyno-correction-standards";
import type { EntryDeclarations } from "./entry-declarations-schema";
import { formatDecimal } from "./format-decimal";
import type { RuleSet } from "./rule-set-schema";
import type { DimensionMap } from "./summarise-dimensions";
import { vehicleWeightKg } from "./vehicle-weight-kg";

/**
 * The entry's power-to-weight ratio in the rule set's unit (mass per power), from the corner
 * scales and the declared dyno figure on the rule's basis; u follows the weight's relative
 * uncertainty (the declared power carries none). Null when the rule set has no such rule.
 */
export function powerToWeightFigure(args: {
  ruleSet: RuleSet;
  dimensions: DimensionMap;
  declarations: EntryDeclarations;
  display: DisplayUnits;
  eventDate: string;
}): PowerToWeightFigure | null {
  const rule = args.ruleSet.powerToWeight;
  if (rule === null) return null;
  const weight = vehicleWeightKg(
    args.dimensions,
    args.declarations,
    args.ruleSet,
    args.display.mass,
  );
  const power = correctedPowerKw(args.declarations.dynoSheet, rule, args.eventDate);
  if (!weight.ok || !power.ok) {
    const missing = [...(weight.ok ? [] : weight.missing), ...(power.ok ? [] : power.missing)];
    const reasons = [...(weight.ok ? [] : [weight.reason]), ...(power.ok ? [] : [power.reason])];
    return { ok: false, missing, reason: reasons.join("; ") };
  }
  if (!(power.powerKw > 0) || !(weight.measurand.value > 0)) {
    return {
      ok: false,
      missing: ["a usable weight and power"],
      reason: "the weight or power is not positive",
    };
  }
  const parts = powerToWeightUnitParts(rule.unit);
  const mass = convertMass(weight.measurand.value, "kg", parts.mass);
  const powerInUnit = convertPower(power.powerKw, "kW", parts.power);
  const ratio = mass / powerInUnit;
  const u = ratio * (weight.measurand.standardUncertainty / weight.measurand.value);
  const where = power.measuredAt === "wheel" ? "at the wheels" : "at the crank";
  return {
    ok: true,
    measurand: { value: ratio, standardUncertainty: u, parts: weight.measurand.parts },
    description: `${weight.description}; ${formatDecimal(powerInUnit, 1)} ${parts.power} ${where}, ${CORRECTION_NAMES[rule.correction]}`,
  };
}
