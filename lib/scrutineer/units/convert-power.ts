import { type PowerUnit, UNIT_FACTORS } from "./unit-factors";

/**
 * Converts a power between kW, W, hp (550 ft·lbf/s) and PS (metric horsepower).
 * @param value power in `from` units
 * @returns power in `to` units
 */
export function convertPower(value: number, from: PowerUnit, to: PowerUnit): number {
  if (from === to) return value;
  return (value * UNIT_FACTORS.kWPer[from]) / UNIT_FACTORS.kWPer[to];
}
