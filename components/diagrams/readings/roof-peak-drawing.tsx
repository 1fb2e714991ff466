import { CarRear } from "../car/car-rear";
import { END } from "../car/end-geometry";
import { DiagramLabel } from "../parts/diagram-label";
import type { DiagramView } from "../parts/diagram-view";
import { GroundLine } from "../parts/ground-line";
import { MeasureLine } from "../parts/measure-line";
import { PointMark } from "../parts/point-mark";
import { projectPoint } from "../parts/project-point";
import { StraightEdge } from "../parts/straight-edge";

const VIEW: DiagramView = { x: 0, y: -12, scale: 1 };
export const ROOF_PEAK_DRAWING_HEIGHT = 160;

/**
 * Rear view: a straight-edge laid level across the roof rests on its highest point and reaches
 * past the side of the car; the reading runs from the ground up to the straight-edge.
 */
export function RoofPeakDrawing() {
  const [px, py] = projectPoint(VIEW, END.roofPeak.x, END.roofPeak.y);
  const [, gy] = projectPoint(VIEW, 0, END.groundY);
  const edgeRight = 236;
  const mx = 226;
  return (
    <g>
      <GroundLine x1={0} x2={240} y={gy} />
      <CarRear view={VIEW} wing="none" />
      <StraightEdge x={70} y={py - 8} width={edgeRight - 70} height={8} />
      <MeasureLine x1={mx} y1={gy} x2={mx} y2={py} />
      <PointMark x={px} y={py} />
      <DiagramLabel x={px} y={py + 24} anchor="middle">
        roof peak
      </DiagramLabel>
      <DiagramLabel x={edgeRight} y={py - 14} anchor="end">
        straight-edge
      </DiagramLabel>
    </g>
  );
}
