import { type DiagramTone, TONE_STROKE } from "../parts/diagram-tones";

/**
 * The room (inside) or the excess (over) between a limit line and the wing: a heavy line in the
 * state's colour with an end bar at each end. No arrowheads, so it still reads when it is short.
 */
export function GapBracket({
  x1,
  y1,
  x2,
  y2,
  tone,
}: {
  x1: number;
  y1: number;
  x2: number;
  y2: number;
  tone: DiagramTone;
}) {
  const length = Math.hypot(x2 - x1, y2 - y1);
  if (length === 0) return null;
  const nx = ((y1 - y2) / length) * 9;
  const ny = ((x2 - x1) / length) * 9;
  const bars = `M ${x1 - nx} ${y1 - ny} L ${x1 + nx} ${y1 + ny} M ${x2 - nx} ${y2 - ny} L ${x2 + nx} ${y2 + ny}`;
  return (
    <g data-part="gap" className={TONE_STROKE[tone]}>
      <line x1={x1} y1={y1} x2={x2} y2={y2} strokeWidth={6} />
      <path d={bars} strokeWidth={4} strokeLinecap="round" />
    </g>
  );
}
