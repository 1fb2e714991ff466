import { convertMass } from "./convert-mass";
import { convertPower } from "./convert-power";
import type { MassUnit, PowerUnit } from "./unit-factors";

/** Power-to-weight units that rule sets use (mass per unit of power; bigger = slower car). */
export const POWER_TO_WEIGHT_UNITS = ["lb/hp", "kg/hp", "kg/kW", "kg/PS", "lb/PS"] as const;
/** A power-to-weight unit, mass over power. */
export type PowerToWeightUnit = (typeof POWER_TO_WEIGHT_UNITS)[number];

const PARTS: Record<PowerToWeightUnit, { mass: MassUnit; power: PowerUnit }> = {
  "lb/hp": { mass: "lb", power: "hp" },
  "kg/hp": { mass: "kg", power: "hp" },
  "kg/kW": { mass: "kg", power: "kW" },
  "kg/PS": { mass: "kg", power: "PS" },
  "lb/PS": { mass: "lb", power: "PS" },
};

/** The mass and power units a power-to-weight unit is made of. */
export function powerToWeightUnitParts(unit: PowerToWeightUnit): {
  mass: MassUnit;
  power: PowerUnit;
} {
  return PARTS[unit];
}

/**
 * Converts a mass-per-power ratio between units, e.g. 10 lb/hp → 4.5359237 kg/hp.
 * @param value ratio in `from` units
 * @returns ratio in `to` units
 */
export function convertPowerToWeight(
  value: number,
  from: PowerToWeightUnit,
  to: PowerToWeightUnit,
): number {
  if (from === to) return value;
  const a = PARTS[from];
  const b = PARTS[to];
  // mass/power: convert the mass up, and divide by how much the power unit grows.
  return convertMass(value, a.mass, b.mass) / convertPower(1, a.power, b.power);
}
