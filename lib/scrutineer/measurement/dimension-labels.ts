import type { Corner, Dimension } from "../records/record-schema";

/** How each dimension is named aloud and on the car card. */
export const DIMENSION_LABELS: Record<Dimension, string> = {
  wingTopFromGroundMm: "wing top height from the ground",
  roofPeakFromGroundMm: "roof peak height from the ground",
  wingOverhangMm: "wing overhang",
  wingSpanMm: "wing span",
  endPlateThicknessMm: "end plate thickness",
  bodyWidthMm: "body width",
  splitterProtrusionMm: "splitter protrusion",
  splitterWidthMm: "splitter width",
  wingChordMm: "wing chord",
  cornerWeightKg: "corner weight",
  noiseDbA: "noise",
};

/** Corner names for the scales. */
export const CORNER_LABELS: Record<Corner, string> = {
  lf: "left front",
  rf: "right front",
  lr: "left rear",
  rr: "right rear",
};

/** The label of a dimension, with the corner when it has one ("corner weight, left front"). */
export function dimensionLabel(dimension: Dimension, corner: Corner | null = null): string {
  const base = DIMENSION_LABELS[dimension];
  return corner === null ? base : `${base}, ${CORNER_LABELS[corner]}`;
}
