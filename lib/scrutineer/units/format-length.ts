import { convertLength } from "./convert-length";
import { formatDecimal } from "./format-decimal";

/** The length units an event can show. */
export type DisplayLengthUnit = "mm" | "in";

/** Display resolution per unit: 0.1 mm, 0.01 in (a sixteenth of an inch is 0.0625 in). */
export const DISPLAY_DECIMALS: Record<DisplayLengthUnit, number> = { mm: 1, in: 2 };

/**
 * Formats a length held in millimetres for display in the event's unit, e.g. 1638.3 → "64.5 in".
 * Rounds only here; the value itself keeps full precision.
 * @param lengthMm length in millimetres
 * @param unit the event's display unit
 * @param decimals override the display resolution
 */
export function formatLength(lengthMm: number, unit: DisplayLengthUnit, decimals?: number): string {
  const value = convertLength(lengthMm, "mm", unit);
  return `${formatDecimal(value, decimals ?? DISPLAY_DECIMALS[unit])} ${unit}`;
}
