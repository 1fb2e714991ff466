import { type DiagramTone, TONE_STROKE } from "./diagram-tones";

/** A ring on the point of the car a reading starts or ends at (wing top, roof peak). */
export function PointMark({ x, y, tone = "accent" }: { x: number; y: number; tone?: DiagramTone }) {
  return (
    <circle cx={x} cy={y} r={6} strokeWidth={3} className={`fill-white ${TONE_STROKE[tone]}`} />
  );
}
