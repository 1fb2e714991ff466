/**
 * The rear and front views of the same hatchback, centred on x = 120, in the car's own units
 * (the whole car fits 240 × 150). The body is widest at the rear quarters (x 36–204); the
 * mirrors stick out beyond it, which is why body width is read without them.
 */
export const END = {
  groundY: 140,
  centreX: 120,
  /** Widest bodywork, mirrors excluded. */
  body: { left: 36, right: 204, widestY: 96, topY: 80 },
  /** Mirror housings, outside the body width. */
  mirrors: { left: 24, right: 216, topY: 66, bottomY: 76 },
  roofPeak: { x: 120, y: 47 },
  tyres: { left: 42, right: 198, width: 22, topY: 110 },
  /** The default wing: outer faces of the end plates, plate thickness, height. */
  wing: { halfSpan: 76, plateThickness: 6, topY: 10, plateHeight: 26, elementTopY: 18 },
  /** Uprights stand this far either side of the centre line. */
  uprightOffset: 34,
  /** Front view: splitter side edges and its height. */
  splitter: { left: 40, right: 200, topY: 126, thickness: 4 },
} as const;

export const END_BODY = "M 46 124 L 40 108 L 36 96 L 40 80 L 200 80 L 204 96 L 200 108 L 194 124 Z";
export const END_GREENHOUSE = "M 54 80 L 72 52 Q 120 42 168 52 L 186 80 Z";
export const END_GLASS = "M 66 77 L 79 57 Q 120 49 161 57 L 174 77 Z";
