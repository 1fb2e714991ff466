import { convertMass } from "./convert-mass";
import { formatDecimal } from "./format-decimal";

/**
 * Formats a mass held in kilograms for display, e.g. 1250 → "1250 kg" or "2755.8 lb".
 * @param massKg mass in kilograms
 * @param unit display unit
 */
export function formatMass(massKg: number, unit: "kg" | "lb", decimals = 1): string {
  return `${formatDecimal(convertMass(massKg, "kg", unit), decimals)} ${unit}`;
}
