/**
 * The side view of Plumbline's generic hatchback, front to the left, in the car's own units
 * (the whole car fits 240 × 150). Every drawing and the class envelope place their marks from
 * these points, so the car, its wing and the measuring marks always agree.
 */
export const SIDE = {
  groundY: 140,
  frontWheel: { x: 60, y: 121, r: 19 },
  rearWheel: { x: 180, y: 121, r: 19 },
  /** The roof's highest point (the roof curves are level there). */
  roofPeak: { x: 146, y: 55 },
  /** The bumper's foremost point. */
  bumperFront: { x: 24, y: 108 },
  /** The rearmost bodywork: the rear bumper's face. */
  bumperRear: { x: 210, y: 96, bottomY: 116 },
  /** Splitter: a plate under the front bumper; its top surface and front edge. */
  splitter: { frontX: 12, rearX: 46, topY: 127, thickness: 4 },
  /** The default wing: top-rear corner of the end plate, which is the wing's highest point. */
  wing: { rearX: 226, topY: 24 },
  /** The hatch runs straight from the roof's rear to the bumper top. */
  hatch: { from: { x: 170, y: 59 }, to: { x: 203, y: 83 } },
} as const;

export const SIDE_BODY =
  "M 32 128 L 26 118 L 24 108 L 28 99 Q 44 91 92 88 L 122 60 Q 130 55 146 55 Q 160 55 170 59 " +
  "L 203 83 Q 209 85 209 92 L 210 96 L 210 116 L 206 126 L 203 126 Q 203 99 180 99 " +
  "Q 157 99 157 126 L 83 126 Q 83 99 60 99 Q 37 99 37 126 L 32 128 Z";

export const SIDE_WINDOW =
  "M 98 85 L 124 63 Q 132 59 146 59 Q 158 59 166 62 L 190 78 Q 150 81 98 85 Z";

/** Where the hatch is at a given x (for the wing's uprights), in the car's units. */
export function hatchYAt(x: number): number {
  const { from, to } = SIDE.hatch;
  const t = Math.min(1, Math.max(0, (x - from.x) / (to.x - from.x)));
  return from.y + t * (to.y - from.y);
}

/** The wing's parts relative to its top-rear corner (rearX, topY), in the car's units. */
export const WING_SIDE = {
  plateLength: 42,
  plateHeight: 24,
  /** Leading edge (front, lower) and trailing edge (rear, higher) of the element. */
  leadingEdge: { dx: -38, dy: 17 },
  trailingEdge: { dx: -4, dy: 8 },
  /** The upright leaves the element here and runs down and forward to the hatch. */
  upright: { dx: -22, dy: 14, mountDx: -30 },
} as const;
