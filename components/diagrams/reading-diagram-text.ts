import { CORNER_LABELS, dimensionLabel } from "@/lib/scrutineer/measurement/dimension-labels";
import type { Corner, Dimension } from "@/lib/scrutineer/records/record-schema";

/** What a reading drawing says in words: its accessible label and its one-line caption. */
export type ReadingDiagramText = { label: string; caption: string };

const HOW: Record<Exclude<Dimension, "cornerWeightKg">, { how: string; caption: string }> = {
  wingTopFromGroundMm: {
    how: "Side view. Measure straight up from the ground to the wing's highest point, the top of the end plate.",
    caption: "Ground to the wing's highest point, straight up.",
  },
  roofPeakFromGroundMm: {
    how: "Rear view. A straight-edge laid level across the roof rests on its highest point; measure from the ground up to the straight-edge.",
    caption: "Ground to a straight-edge resting across the roof peak.",
  },
  wingOverhangMm: {
    how: "Side view of the rear. Hang a plumb line from the wing's rearmost point and one from the rearmost bodywork, mark the floor under each, and measure between the two marks: plus when the wing is behind the bodywork.",
    caption: "Between the two floor marks; + when the wing is behind the bodywork.",
  },
  wingSpanMm: {
    how: "Rear view. Hold a straight-edge upright against the outer face of each end plate and measure between them; the end plates count in the span.",
    caption: "Between straight-edges at the end plates' outer faces.",
  },
  endPlateThicknessMm: {
    how: "Rear view, close up on one end plate. Measure across the plate from its inner face to its outer face.",
    caption: "One end plate, inner face to outer face.",
  },
  bodyWidthMm: {
    how: "Rear view. Hang a plumb line from the widest bodywork on each side, mirrors excluded, mark the floor under each, and measure between the marks.",
    caption: "Widest bodywork side to side, mirrors excluded.",
  },
  splitterProtrusionMm: {
    how: "Side view of the nose. Hang a plumb line from the bumper's foremost point to mark the splitter, then measure forward from the mark to the splitter's front edge.",
    caption: "Bumper's foremost point forward to the splitter's front edge.",
  },
  splitterWidthMm: {
    how: "Front view. Measure across the splitter from one side edge to the other.",
    caption: "Across the splitter, side edge to side edge.",
  },
  wingChordMm: {
    how: "Side view, close up on the wing. Measure straight from the element's leading edge to its trailing edge.",
    caption: "The element, leading edge to trailing edge.",
  },
  noiseDbA: {
    how: "Top view of the rear. Hold the meter 0.5 m from the exhaust outlet at 45° to the line the outlet points along, with the engine held at three quarters of its maximum speed.",
    caption: "Meter 0.5 m from the outlet, 45° off its line; engine at ¾ of max speed.",
  },
};

/**
 * The words for a reading's drawing. The label names the dimension exactly as the car card
 * does ({@link dimensionLabel}), then says where and how the reading is taken.
 */
export function readingDiagramText(
  dimension: Dimension,
  corner: Corner | null = null,
): ReadingDiagramText {
  if (dimension === "cornerWeightKg") {
    const name = dimensionLabel(dimension, corner);
    if (corner === null) {
      return {
        label: `Where the reading is taken: ${name}. Top view, front up. Each wheel stands on its own scale pad; one reading per pad.`,
        caption: "Each wheel on its own scale pad, one reading per pad.",
      };
    }
    const where = CORNER_LABELS[corner];
    return {
      label: `Where the reading is taken: ${name}. Top view, front up. Each wheel stands on its own scale pad; this reading is the ${where} pad.`,
      caption: `The ${where} wheel's scale pad.`,
    };
  }
  const { how, caption } = HOW[dimension];
  return { label: `Where the reading is taken: ${dimensionLabel(dimension)}. ${how}`, caption };
}
