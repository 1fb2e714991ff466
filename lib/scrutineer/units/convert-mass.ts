import { type MassUnit, UNIT_FACTORS } from "./unit-factors";

/**
 * Converts a mass between kilograms and pounds (NIST SP 811: 1 lb = 0.45359237 kg exactly).
 * @param value mass in `from` units
 * @returns mass in `to` units
 */
export function convertMass(value: number, from: MassUnit, to: MassUnit): number {
  if (from === to) return value;
  return (value * UNIT_FACTORS.kgPer[from]) / UNIT_FACTORS.kgPer[to];
}
