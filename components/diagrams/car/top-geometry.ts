import type { Corner } from "@/lib/scrutineer/records/record-schema";

/**
 * The hatchback from above, front at the top, centred on x = 120, in the car's own units
 * (it fits 240 × 250). Left and right are the driver's, which from above with the front at the
 * top are also the reader's.
 */
export const TOP = {
  centreX: 120,
  front: 22,
  rear: 222,
  body: { left: 72, right: 168 },
  wheel: { width: 14, length: 32, frontY: 64, rearY: 182, leftX: 72, rightX: 168 },
  /** Exhaust outlet: the pipe's end and the way it points (straight back). */
  outlet: { x: 148, y: 232 },
} as const;

/** The centre of a wheel (and of the scale pad under it). */
export function wheelCentre(corner: Corner): { x: number; y: number } {
  const w = TOP.wheel;
  return {
    x: corner === "lf" || corner === "lr" ? w.leftX : w.rightX,
    y: corner === "lf" || corner === "rf" ? w.frontY : w.rearY,
  };
}

export const TOP_BODY =
  "M 84 24 Q 120 14 156 24 Q 168 28 168 44 L 168 202 Q 168 220 150 222 L 90 222 " +
  "Q 72 220 72 202 L 72 44 Q 72 28 84 24 Z";
export const TOP_GLASS = "M 84 92 Q 120 80 156 92 L 153 176 Q 120 181 87 176 Z";
export const TOP_ROOF = "M 90 106 Q 120 101 150 106 L 148 164 Q 120 167 92 164 Z";
