import { type PressureUnit, UNIT_FACTORS } from "./unit-factors";

/**
 * Converts a pressure between kPa, hPa, mbar and inHg (conventional).
 * @param value pressure in `from` units
 * @returns pressure in `to` units
 */
export function convertPressure(value: number, from: PressureUnit, to: PressureUnit): number {
  if (from === to) return value;
  return (value * UNIT_FACTORS.kPaPer[from]) / UNIT_FACTORS.kPaPer[to];
}
