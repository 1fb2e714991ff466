import type { EntryDeclarations } from "../classes/entry-declarations-schema";
import type { DimensionMap } from "../measurement/summarise-dimensions";
import type { RuleSet } from "../rule-sets/rule-set-schema";
import { convertMass } from "../units/convert-mass";
import { convertPower } from "../units/convert-power";
import { powerToWeightUnitParts } from "../units/convert-power-to-weight";
import type { DisplayUnits } from "../units/display-units";
import type { PowerToWeightFigure } from "./class-check-context";
import { correctedPowerKw } from "./corrected-power-kw";
import { describeDynoPower } from "./describe-dyno-power";
import { vehicleWeightKg } from "./vehicle-weight-kg";

/**
 * The entry's power-to-weight ratio in the rule set's unit (mass per power), from the corner
 * scales and the declared dyno figure on the rule's basis; u follows the weight's relative
 * uncertainty (the declared power carries none). The description shows the weight (in kg for a
 * kg-based rule, else the event's unit) and how the power came from the sheet (correction
 * multiplier, crank-to-wheel factor). Null when the rule set has no such rule.
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
  const parts = powerToWeightUnitParts(rule.unit);
  // A kg-based rule is explained in kg, whatever the event shows, so its arithmetic can be followed.
  const massUnit = parts.mass === "kg" ? "kg" : args.display.mass;
  const weight = vehicleWeightKg(args.dimensions, args.declarations, args.ruleSet, massUnit);
  const sheet = args.declarations.dynoSheet;
  const power = correctedPowerKw(sheet, rule, args.eventDate);
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
  const mass = convertMass(weight.measurand.value, "kg", parts.mass);
  const powerInUnit = convertPower(power.powerKw, "kW", parts.power);
  const ratio = mass / powerInUnit;
  const u = ratio * (weight.measurand.standardUncertainty / weight.measurand.value);
  const powerText =
    sheet === null ? "" : describeDynoPower({ sheet, power, rule, powerUnit: parts.power });
  return {
    ok: true,
    measurand: { value: ratio, standardUncertainty: u, parts: weight.measurand.parts },
    description: `${weight.description}; ${powerText}`,
  };
}
