import { SIDE } from "../car/side-geometry";
import type { EnvelopeCheck, EnvelopeHeightCheck } from "./envelope-types";
import { type AxisScale, placeOnAxis } from "./place-on-axis";

/** Not to scale: about 7 mm per unit of the car's space, steps kept between 12 and 24 units. */
export const SIDE_AXIS: AxisScale = { unitsPerMm: 0.15, minGap: 12, maxGap: 24 };
/** Where an unmeasured wing is sketched, inside its limit, in the car's units. */
const SKETCH_INSIDE = 12;

/** Where the side view puts the limits and the wing, in the car's units (y grows downward). */
export type SideEnvelopeLayout = {
  /** The height limit as a level line; null when the class sets none. */
  heightLimitY: number | null;
  /** The overhang limit as an upright line; null when the class sets none. */
  overhangLimitX: number | null;
  /** The wing's top (highest point) and rear (rearmost point). */
  wingTopY: number;
  wingRearX: number;
  /** False where the wing's place on that axis is a sketch, not a reading. */
  heightMeasured: boolean;
  overhangMeasured: boolean;
};

/**
 * Lays out the side view so that it tells the truth about order: the wing's top is above the
 * height line exactly when the reading is over the limit (level with it when equal), and its
 * rear is beyond the overhang line exactly when the overhang is over. Heights above the roof
 * are placed from the roof's peak; heights from the ground from the limit line, since the
 * roof's own height is not among the props.
 */
export function sideEnvelopeLayout(
  height: EnvelopeHeightCheck,
  overhang: EnvelopeCheck,
): SideEnvelopeLayout {
  const roofY = SIDE.roofPeak.y;
  const bumperX = SIDE.bumperRear.x;

  let heightLimitY: number | null = null;
  let wingTopY: number = SIDE.wing.topY;
  if (height.reference === "roof-peak") {
    const values = [height.limitMm, height.measuredMm].filter((v): v is number => v !== null);
    const up = placeOnAxis(0, values, SIDE_AXIS);
    if (height.limitMm !== null) heightLimitY = roofY - up(height.limitMm);
    if (height.measuredMm !== null) wingTopY = roofY - up(height.measuredMm);
    else if (heightLimitY !== null) wingTopY = heightLimitY + SKETCH_INSIDE;
  } else {
    // Ground reference: the line sits a fixed step above the roof; the wing is placed from it.
    const lineY = roofY - 24;
    if (height.limitMm !== null) {
      heightLimitY = lineY;
      const values = height.measuredMm === null ? [] : [height.measuredMm];
      const up = placeOnAxis(height.limitMm, values, SIDE_AXIS);
      wingTopY = height.measuredMm === null ? lineY + SKETCH_INSIDE : lineY - up(height.measuredMm);
    }
  }

  let overhangLimitX: number | null = null;
  let wingRearX: number = SIDE.wing.rearX;
  const values = [overhang.limitMm, overhang.measuredMm].filter((v): v is number => v !== null);
  const back = placeOnAxis(0, values, SIDE_AXIS);
  if (overhang.limitMm !== null) overhangLimitX = bumperX + back(overhang.limitMm);
  if (overhang.measuredMm !== null) wingRearX = bumperX + back(overhang.measuredMm);
  else if (overhangLimitX !== null) wingRearX = overhangLimitX - SKETCH_INSIDE;

  return {
    heightLimitY,
    overhangLimitX,
    wingTopY,
    wingRearX,
    heightMeasured: height.measuredMm !== null,
    overhangMeasured: overhang.measuredMm !== null,
  };
}
