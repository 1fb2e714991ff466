import { CarRear } from "../car/car-rear";
import { END } from "../car/end-geometry";
import { DiagramLabel } from "../parts/diagram-label";
import type { DiagramView } from "../parts/diagram-view";
import { GroundLine } from "../parts/ground-line";
import { MeasureLine } from "../parts/measure-line";
import { projectPoint } from "../parts/project-point";
import { StraightEdge } from "../parts/straight-edge";

const VIEW: DiagramView = { x: 0, y: -34, scale: 1 };
export const WING_SPAN_DRAWING_HEIGHT = 182;

/**
 * Rear view: a straight-edge held upright against each end plate's outer face; the reading is
 * the distance between them, so the end plates are counted in the span.
 */
export function WingSpanDrawing() {
  const w = END.wing;
  const [lx, top] = projectPoint(VIEW, END.centreX - w.halfSpan, w.topY);
  const [rx, bottom] = projectPoint(VIEW, END.centreX + w.halfSpan, w.topY + w.plateHeight);
  const [, gy] = projectPoint(VIEW, 0, END.groundY);
  const edgeTop = top - 22;
  const edgeHeight = bottom - edgeTop + 10;
  const my = top - 12;
  return (
    <g>
      <GroundLine x1={0} x2={240} y={gy} />
      <CarRear view={VIEW} />
      <StraightEdge x={lx - 7} y={edgeTop} width={7} height={edgeHeight} />
      <StraightEdge x={rx} y={edgeTop} width={7} height={edgeHeight} />
      <line x1={lx} y1={top} x2={lx} y2={bottom} strokeWidth={4} className="stroke-accent" />
      <line x1={rx} y1={top} x2={rx} y2={bottom} strokeWidth={4} className="stroke-accent" />
      <MeasureLine x1={lx} y1={my} x2={rx} y2={my} />
      <DiagramLabel x={(lx + rx) / 2} y={edgeTop - 2} anchor="middle" tone="accent">
        span
      </DiagramLabel>
    </g>
  );
}
