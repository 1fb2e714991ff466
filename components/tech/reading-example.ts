import type { Dimension } from "@/lib/scrutineer/records/record-schema";
import { convertLength } from "@/lib/scrutineer/units/convert-length";
import { convertMass } from "@/lib/scrutineer/units/convert-mass";

/** A plausible size for each reading on a club car (a hint, never a limit or a check value). */
const EXAMPLE_MM: Record<Exclude<Dimension, "cornerWeightKg" | "noiseDbA">, number> = {
  wingTopFromGroundMm: 1450,
  roofPeakFromGroundMm: 1330,
  wingOverhangMm: 150,
  wingSpanMm: 1600,
  endPlateThicknessMm: 6,
  bodyWidthMm: 1750,
  splitterProtrusionMm: 60,
  splitterWidthMm: 1700,
  wingChordMm: 280,
};
const EXAMPLE_KG = 310;
const EXAMPLE_DBA = 98.5;

/** Inches to the nearest eighth, written as a tape reads: 57 1/8", 63", 1/4". */
function inchesAsTapeReads(inches: number): string {
  const eighths = Math.round(inches * 8);
  const whole = Math.floor(eighths / 8);
  let num = eighths % 8;
  let den = 8;
  while (num > 0 && num % 2 === 0) {
    num /= 2;
    den /= 2;
  }
  const fraction = num === 0 ? "" : `${num}/${den}`;
  if (whole === 0 && fraction !== "") return `${fraction}"`;
  return fraction === "" ? `${whole}"` : `${whole} ${fraction}"`;
}

/**
 * The placeholder of a reading's field: a sensible example for that dimension in the event's
 * unit ("e.g. 6 mm" for an end plate, 'e.g. 57 1/8"' for a wing top at an inch event).
 */
export function readingExample(dimension: Dimension, unitSystem: "mm" | "in"): string {
  // Weights and levels are typed as bare numbers; the unit is said after the example.
  if (dimension === "noiseDbA") return `e.g. ${EXAMPLE_DBA}, in dB(A)`;
  if (dimension === "cornerWeightKg") {
    return unitSystem === "mm"
      ? `e.g. ${EXAMPLE_KG}, in kg`
      : `e.g. ${Math.round(convertMass(EXAMPLE_KG, "kg", "lb") / 5) * 5}, in lb`;
  }
  const mm = EXAMPLE_MM[dimension];
  return unitSystem === "mm"
    ? `e.g. ${mm} mm`
    : `e.g. ${inchesAsTapeReads(convertLength(mm, "mm", "in"))}`;
}
