import type { Dimension } from "@/lib/scrutineer/records/record-schema";
import { convertMass } from "@/lib/scrutineer/units/convert-mass";
import { formatDecimal } from "@/lib/scrutineer/units/format-decimal";
import { formatLength } from "@/lib/scrutineer/units/format-length";

/** A reading's value in the event's units ("1380.0 mm", "54.33 in", "312.0 kg", "98.5 dB(A)"). */
export function formatReadingValue(
  dimension: Dimension,
  value: number,
  unitSystem: "mm" | "in",
): string {
  if (dimension === "noiseDbA") return `${formatDecimal(value, 1)} dB(A)`;
  if (dimension === "cornerWeightKg") {
    return unitSystem === "mm"
      ? `${formatDecimal(value, 1)} kg`
      : `${formatDecimal(convertMass(value, "kg", "lb"), 1)} lb`;
  }
  return formatLength(value, unitSystem);
}
