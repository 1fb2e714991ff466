import { type LengthUnit, UNIT_FACTORS } from "./unit-factors";

/**
 * Converts a length between units using the NIST SP 811 factors. Full precision; round only
 * for display.
 * @param value length in `from` units
 * @returns length in `to` units
 */
export function convertLength(value: number, from: LengthUnit, to: LengthUnit): number {
  if (from === to) return value;
  return (value * UNIT_FACTORS.mmPer[from]) / UNIT_FACTORS.mmPer[to];
}
