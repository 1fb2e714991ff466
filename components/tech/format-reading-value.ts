import { convertMass } from "@/lib/scrutineer/convert-mass";
import { formatDecimal } from "@/lib/scrutineer/format-decimal";
import { formatLength } from "@/lib/scrutineer/format-length";
import type { Dimension } from "@/lib/scrutineer/record-schema";

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
