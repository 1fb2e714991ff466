import { CORNERS, type Corner } from "@/lib/scrutineer/records/record-schema";
import { CarTop } from "../car/car-top";
import { wheelCentre } from "../car/top-geometry";
import { DiagramLabel } from "../parts/diagram-label";
import type { DiagramView } from "../parts/diagram-view";
import { projectPoint } from "../parts/project-point";
import { CornerPadLabel } from "./corner-pad-label";

const VIEW: DiagramView = { x: 0, y: -6, scale: 1 };
export const CORNER_WEIGHT_DRAWING_HEIGHT = 240;
const PAD = { width: 38, length: 50 };

/**
 * Top view, front up: each wheel on its own scale pad. The pad for `corner` is drawn in the
 * accent colour and named beside it; with no corner, all four are.
 */
export function CornerWeightDrawing({ corner }: { corner: Corner | null }) {
  const pad = (c: Corner) => {
    const { x, y } = wheelCentre(c);
    const [px, py] = projectPoint(VIEW, x - PAD.width / 2, y - PAD.length / 2);
    return { x: px, y: py, width: PAD.width, height: PAD.length };
  };
  const picked = (c: Corner) => corner === null || corner === c;
  return (
    <g>
      {CORNERS.map((c) => (
        <rect
          key={c}
          {...pad(c)}
          rx={3}
          strokeWidth={3}
          className={picked(c) ? "fill-accent-soft stroke-accent" : "fill-white stroke-asphalt-500"}
        />
      ))}
      <CarTop view={VIEW} />
      {CORNERS.filter(picked).map((c) => (
        // Drawn again over the car so the whole pad outline shows.
        <rect
          key={c}
          {...pad(c)}
          rx={3}
          strokeWidth={5}
          className="fill-none stroke-accent"
          data-corner={c}
        />
      ))}
      {corner === null ? null : <CornerPadLabel corner={corner} pad={pad(corner)} />}
      <path d="M 120 4 L 113 14 L 127 14 Z" className="fill-asphalt-950" />
      <DiagramLabel x={132} y={16} anchor="start">
        front
      </DiagramLabel>
    </g>
  );
}
