import { END } from "../car/end-geometry";
import type { EnvelopeSpanCheck } from "./envelope-types";
import { type AxisScale, placeOnAxis } from "./place-on-axis";

/** Not to scale, per side of the car: steps kept between 9 and 24 units of the car's space. */
export const REAR_AXIS: AxisScale = { unitsPerMm: 0.1, minGap: 9, maxGap: 24 };

/** Where the rear view puts the span limit and the wing, as half-widths from the centre line. */
export type RearEnvelopeLayout = {
  bodyHalf: number;
  /** The allowed half-width (body + half the allowance); null when the class sets none. */
  limitHalf: number | null;
  /** Centre line to the end plates' outer faces. */
  wingHalf: number;
  /** The edge the rule compares: outer faces, or inner faces when end plates are not counted. */
  comparedHalf: number;
  measured: boolean;
};

/**
 * Lays out the rear view so the compared edge of the wing is outside the limit lines exactly
 * when the span is over, level with them when equal. Each side carries half the excess.
 */
export function rearEnvelopeLayout(span: EnvelopeSpanCheck): RearEnvelopeLayout {
  const bodyHalf = END.body.right - END.centreX;
  const plate = END.wing.plateThickness;
  const halves = [span.limitMm, span.measuredMm]
    .filter((v): v is number => v !== null)
    .map((v) => v / 2);
  const out = placeOnAxis(0, halves, REAR_AXIS);
  const limitHalf = span.limitMm === null ? null : bodyHalf + out(span.limitMm / 2);
  let comparedHalf: number;
  if (span.measuredMm !== null) comparedHalf = bodyHalf + out(span.measuredMm / 2);
  else comparedHalf = (limitHalf ?? bodyHalf) - 10;
  const wingHalf = span.endPlatesCounted ? comparedHalf : comparedHalf + plate;
  return { bodyHalf, limitHalf, wingHalf, comparedHalf, measured: span.measuredMm !== null };
}
