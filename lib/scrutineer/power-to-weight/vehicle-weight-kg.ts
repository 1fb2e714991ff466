import type { EntryDeclarations } from "../classes/entry-declarations-schema";
import { combineLinear, type Measurand } from "../measurement/combine-linear";
import { CORNER_LABELS } from "../measurement/dimension-labels";
import { type DimensionMap, dimensionKey } from "../measurement/summarise-dimensions";
import { CORNERS } from "../records/record-schema";
import type { RuleSet } from "../rule-sets/rule-set-schema";
import { formatMass } from "../units/format-mass";

/** The class weight, or what is still needed for it. */
export type VehicleWeight =
  | { ok: true; measurand: Measurand; description: string }
  | { ok: false; missing: string[]; reason: string };

/**
 * The weight the power-to-weight rule uses, in kg: the four corner scales summed (u from each
 * corner's combined readings), then the driver added or taken off when the weighing condition
 * differs from the rule's basis (declared driver weight, or the rule's fixed mass), and ballast
 * taken off when the rule says it does not count.
 */
export function vehicleWeightKg(
  dimensions: DimensionMap,
  declarations: EntryDeclarations,
  ruleSet: RuleSet,
  massUnit: "kg" | "lb",
): VehicleWeight {
  const rule = ruleSet.powerToWeight;
  if (rule === null) return { ok: false, missing: [], reason: "no power-to-weight rule" };
  const missingCorners = CORNERS.filter((c) => !dimensions.has(dimensionKey("cornerWeightKg", c)));
  if (missingCorners.length > 0) {
    const names = missingCorners.map((c) => `corner weight, ${CORNER_LABELS[c]}`);
    return { ok: false, missing: names, reason: `waiting for the ${names.join(", ")}` };
  }
  const terms = CORNERS.map((c) => {
    const summary = dimensions.get(dimensionKey("cornerWeightKg", c));
    if (summary === undefined) throw new Error("unreachable: corners checked above");
    return { coefficient: 1, summary };
  });
  const scales = combineLinear(terms);
  let value = scales.value;
  const notes = [`${formatMass(scales.value, massUnit)} on the scales`];
  const weighedWithDriver = ruleSet.measurement.weighing.driverAboard;
  const wantDriver = rule.weightBasis === "with-driver";
  if (weighedWithDriver !== wantDriver) {
    let driverKg: number;
    let source: string;
    if (rule.driverMass.kind === "fixed") {
      driverKg = rule.driverMass.kg;
      source = "the rule's driver mass";
    } else if (declarations.driverWeightKg !== null) {
      driverKg = declarations.driverWeightKg;
      source = "declared driver";
    } else {
      return {
        ok: false,
        missing: ["driver weight declaration"],
        reason: "waiting for the declared driver weight",
      };
    }
    value += wantDriver ? driverKg : -driverKg;
    notes.push(`${wantDriver ? "+" : "−"} ${formatMass(driverKg, massUnit)} ${source}`);
  }
  if (!rule.ballastCounts && declarations.ballastKg > 0) {
    value -= declarations.ballastKg;
    notes.push(`− ${formatMass(declarations.ballastKg, massUnit)} ballast, which does not count`);
  }
  const basis = wantDriver ? "with driver" : "without driver";
  const description =
    notes.length === 1
      ? `${formatMass(value, massUnit)} ${basis}`
      : `${formatMass(value, massUnit)} ${basis}: ${notes.join(" ")}`;
  return { ok: true, measurand: { ...scales, value }, description };
}
