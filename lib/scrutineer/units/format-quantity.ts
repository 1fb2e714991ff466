import type { RuleUnit } from "../verdicts/verdict-schema";
import { convertLength } from "./convert-length";
import type { DisplayUnits } from "./display-units";
import { formatDecimal } from "./format-decimal";
import { DISPLAY_DECIMALS } from "./format-length";

function parts(
  value: number,
  unit: RuleUnit,
  display: DisplayUnits,
): { text: string; unit: string } {
  switch (unit) {
    case "mm": {
      const shown = convertLength(value, "mm", display.length);
      return { text: formatDecimal(shown, DISPLAY_DECIMALS[display.length]), unit: display.length };
    }
    case "dB(A)":
      return { text: formatDecimal(value, 1), unit: "dB(A)" };
    case "points":
      return { text: formatDecimal(value, 1), unit: "points" };
    case "treadwear":
      return { text: formatDecimal(value, 0), unit: "" };
    case "cc":
      return { text: formatDecimal(value, 0), unit: "cc" };
    case "none":
      return { text: formatDecimal(value, 3), unit: "" };
    default:
      return { text: formatDecimal(value, 2), unit };
  }
}

/**
 * Formats a rule's quantity for reading aloud in the event's units, optionally with its
 * expanded uncertainty: (205.04, "mm") → "205 mm"; with U 2.8 → "205 ± 2.8 mm".
 * @param value in the rule unit (lengths in mm)
 */
export function formatQuantity(
  value: number,
  unit: RuleUnit,
  display: DisplayUnits,
  expandedUncertainty?: number,
): string {
  const v = parts(value, unit, display);
  const u = expandedUncertainty === undefined ? null : parts(expandedUncertainty, unit, display);
  const number = u === null ? v.text : `${v.text} ± ${u.text}`;
  return v.unit === "" ? number : `${number} ${v.unit}`;
}

/** True when the quantity shows as zero at display resolution. */
export function showsAsZero(value: number, unit: RuleUnit, display: DisplayUnits): boolean {
  return /^-?0(\.0*)?$/.test(parts(value, unit, display).text);
}

/** The display resolution of a unit, as text ("0.1 mm"). */
export function displayResolution(unit: RuleUnit, display: DisplayUnits): string {
  if (unit === "mm") return display.length === "mm" ? "0.1 mm" : "0.01 in";
  if (unit === "dB(A)") return "0.1 dB(A)";
  if (unit === "treadwear" || unit === "cc") return unit === "cc" ? "1 cc" : "1";
  if (unit === "points") return "0.1 points";
  return `0.01 ${unit}`;
}
