import type { Dimension, ReadingPayload } from "../records/record-schema";
import type { RuleSet } from "../rule-sets/rule-set-schema";
import { convertLength } from "../units/convert-length";
import { convertMass } from "../units/convert-mass";
import { formatGroupedDecimal } from "../units/format-grouped-decimal";
import { CORNER_LABELS } from "./dimension-labels";
import type { ReadingContext } from "./reading-context";

type Unit = "mm" | "in";

/** A value of a dimension in the event's unit, thousands grouped ("99,999 mm", "64.5 in"). */
function say(dimension: Dimension, value: number, unitSystem: Unit): string {
  if (dimension === "noiseDbA") return `${formatGroupedDecimal(value, 1)} dB(A)`;
  if (dimension === "cornerWeightKg") {
    return unitSystem === "mm"
      ? `${formatGroupedDecimal(value, 1)} kg`
      : `${formatGroupedDecimal(convertMass(value, "kg", "lb"), 1)} lb`;
  }
  return `${formatGroupedDecimal(convertLength(value, "mm", unitSystem), unitSystem === "mm" ? 1 : 2)} ${unitSystem}`;
}

/** A range in the event's unit with one unit at the end ("900–2,000 mm", "-1,500 to 700 mm"). */
function sayRange(dimension: Dimension, min: number, max: number, unitSystem: Unit): string {
  const [lo = "", hi = ""] = [say(dimension, min, unitSystem), say(dimension, max, unitSystem)];
  const unit = hi.slice(hi.indexOf(" "));
  // "−1,500 to 700 mm" reads better than a dash between a minus and a number.
  const between = min < 0 ? " to " : "–";
  return `${lo.slice(0, lo.indexOf(" "))}${between}${hi.slice(0, hi.indexOf(" "))}${unit}`;
}

/** How a reading is said at the start of a sentence ("Wing top 99,999 mm above the ground"). */
function subject(reading: ReadingPayload, unitSystem: Unit): string {
  const v = say(reading.dimension, reading.value, unitSystem);
  switch (reading.dimension) {
    case "wingTopFromGroundMm":
      return `Wing top ${v} above the ground`;
    case "roofPeakFromGroundMm":
      return `Roof peak ${v} above the ground`;
    case "wingOverhangMm":
      return `Wing overhang ${v}`;
    case "wingSpanMm":
      return `Wing span ${v}`;
    case "endPlateThicknessMm":
      return `End plate ${v} thick`;
    case "bodyWidthMm":
      return `Body width ${v}`;
    case "splitterProtrusionMm":
      return `Splitter ${v} forward of the bumper`;
    case "splitterWidthMm":
      return `Splitter width ${v}`;
    case "wingChordMm":
      return `Wing chord ${v}`;
    case "cornerWeightKg":
      return `Corner weight ${v} on the ${CORNER_LABELS[reading.corner]} scale`;
    case "noiseDbA":
      return `Noise ${v}`;
  }
}

const CHECK = "check the number and the unit";

/**
 * Why a reading cannot plausibly be true, in words a scrutineer can act on, or null when it can:
 * - outside the rule set's plausible range for its dimension (`measurement.plausible`; none set,
 *   no check beyond the hard caps of `reading-limits.ts`): "Wing top 99,999 mm above the ground
 *   is more than any car at the tech line measures (plausible 700–2,000 mm); check the number
 *   and the unit";
 * - against the car's own other readings ({@link readingContext}), where geometry rules it out:
 *   a wing top lower than half the roof peak's height (below the car's waist, so no wing
 *   stands there); end plates that together are wider than the wing span; a wing chord longer than
 *   the wing span; a wing or splitter more than half as wide again as the body. These are common
 *   practice (no source): they catch a number typed into the wrong field, not an unusual car.
 * A warning, never a refusal: the phone asks "Check this reading" and the scrutineer may save
 * anyway; the engine keeps the reading and marks the verdict for the chief scrutineer.
 */
export function implausibleReading(args: {
  reading: ReadingPayload;
  ruleSet: Pick<RuleSet, "measurement">;
  context: ReadingContext;
  unitSystem: Unit;
}): string | null {
  const { reading, context, unitSystem } = args;
  const range = args.ruleSet.measurement.plausible?.[reading.dimension];
  if (range !== undefined && (reading.value < range.min || reading.value > range.max)) {
    const side = reading.value > range.max ? "more" : "less";
    return `${subject(reading, unitSystem)} is ${side} than any car at the tech line measures (plausible ${sayRange(reading.dimension, range.min, range.max, unitSystem)}); ${CHECK}`;
  }
  const other = (d: Dimension) => context[d];
  const against = (d: Dimension, words: string) => {
    const value = other(d);
    return value === undefined ? "" : `${words} (${say(d, value, unitSystem)})`;
  };
  switch (reading.dimension) {
    case "wingTopFromGroundMm": {
      const roof = other("roofPeakFromGroundMm");
      if (roof !== undefined && reading.value < roof / 2) {
        return `${subject(reading, unitSystem)} is lower than half the ${against("roofPeakFromGroundMm", "roof peak's height")}, below where any wing stands; ${CHECK}`;
      }
      return null;
    }
    case "roofPeakFromGroundMm": {
      const top = other("wingTopFromGroundMm");
      if (top !== undefined && top < reading.value / 2) {
        return `${subject(reading, unitSystem)} is more than twice the ${against("wingTopFromGroundMm", "wing top's height")}; ${CHECK}`;
      }
      return null;
    }
    case "endPlateThicknessMm": {
      const span = other("wingSpanMm");
      if (span !== undefined && 2 * reading.value >= span) {
        return `${subject(reading, unitSystem)} makes two end plates wider than the ${against("wingSpanMm", "wing span")}; ${CHECK}`;
      }
      return null;
    }
    case "wingChordMm": {
      const span = other("wingSpanMm");
      if (span !== undefined && reading.value > span) {
        return `${subject(reading, unitSystem)} is longer than the ${against("wingSpanMm", "wing span")}; ${CHECK}`;
      }
      return null;
    }
    case "wingSpanMm":
    case "splitterWidthMm": {
      const body = other("bodyWidthMm");
      if (body !== undefined && reading.value > 1.5 * body) {
        return `${subject(reading, unitSystem)} is more than half as wide again as the ${against("bodyWidthMm", "body")}; ${CHECK}`;
      }
      return null;
    }
    default:
      return null;
  }
}
