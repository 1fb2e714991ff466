import { type DiagramTone, TONE_FILL, TONE_STROKE } from "./diagram-tones";

const ARROW_LENGTH = 11;
const ARROW_HALF_WIDTH = 6;
const TICK_HALF = 8;

/**
 * The measured segment: a thick line with an arrowhead at each end, touching the two points
 * the reading runs between. `arrows-outside` points the heads inward from beyond the ends, for
 * spans too short to hold two heads (an end plate's thickness); `ticks` adds end bars.
 */
export function MeasureLine({
  x1,
  y1,
  x2,
  y2,
  ends = "arrows",
  tone = "accent",
  dashed = false,
}: {
  x1: number;
  y1: number;
  x2: number;
  y2: number;
  ends?: "arrows" | "arrows-outside" | "ticks";
  tone?: DiagramTone;
  dashed?: boolean;
}) {
  const length = Math.hypot(x2 - x1, y2 - y1);
  if (length === 0) return null;
  const ux = (x2 - x1) / length;
  const uy = (y2 - y1) / length;
  const head = (tipX: number, tipY: number, dirX: number, dirY: number) => {
    // dir points from the base of the head to its tip.
    const bx = tipX - dirX * ARROW_LENGTH;
    const by = tipY - dirY * ARROW_LENGTH;
    const px = -dirY * ARROW_HALF_WIDTH;
    const py = dirX * ARROW_HALF_WIDTH;
    return `M ${r(tipX)} ${r(tipY)} L ${r(bx + px)} ${r(by + py)} L ${r(bx - px)} ${r(by - py)} Z`;
  };
  const stroke = TONE_STROKE[tone];
  const fill = TONE_FILL[tone];
  const dash = dashed ? "7 5" : undefined;

  if (ends === "arrows-outside") {
    const tail = ARROW_LENGTH + 10;
    return (
      <g>
        <line
          x1={r(x1 - ux * tail)}
          y1={r(y1 - uy * tail)}
          x2={r(x2 + ux * tail)}
          y2={r(y2 + uy * tail)}
          strokeWidth={4}
          strokeDasharray={dash}
          className={stroke}
        />
        <path d={head(x1, y1, ux, uy)} className={fill} />
        <path d={head(x2, y2, -ux, -uy)} className={fill} />
      </g>
    );
  }

  const inset = Math.min(ARROW_LENGTH - 1, length / 2);
  const ticks =
    ends === "ticks"
      ? [
          [x1, y1],
          [x2, y2],
        ].map(([x = 0, y = 0]) => (
          <line
            key={`${x},${y}`}
            x1={r(x - uy * TICK_HALF)}
            y1={r(y + ux * TICK_HALF)}
            x2={r(x + uy * TICK_HALF)}
            y2={r(y - ux * TICK_HALF)}
            strokeWidth={4}
            strokeLinecap="round"
            className={stroke}
          />
        ))
      : null;
  return (
    <g>
      <line
        x1={r(x1 + ux * inset)}
        y1={r(y1 + uy * inset)}
        x2={r(x2 - ux * inset)}
        y2={r(y2 - uy * inset)}
        strokeWidth={4}
        strokeDasharray={dash}
        className={stroke}
      />
      <path d={head(x1, y1, -ux, -uy)} className={fill} />
      <path d={head(x2, y2, ux, uy)} className={fill} />
      {ticks}
    </g>
  );
}

function r(value: number): number {
  return Math.round(value * 100) / 100;
}
