import { CarSide } from "../car/car-side";
import { SIDE } from "../car/side-geometry";
import { DiagramLabel } from "../parts/diagram-label";
import type { DiagramView } from "../parts/diagram-view";
import { ExtensionLine } from "../parts/extension-line";
import { GroundLine } from "../parts/ground-line";
import { MeasureLine } from "../parts/measure-line";
import { PointMark } from "../parts/point-mark";
import { projectPoint } from "../parts/project-point";

const VIEW: DiagramView = { x: 2, y: -8, scale: 1 };
export const WING_TOP_DRAWING_HEIGHT = 156;

/** Side view: ground straight up to the wing's highest point (the end plate's top). */
export function WingTopDrawing() {
  const [wx, wy] = projectPoint(VIEW, SIDE.wing.rearX - 4, SIDE.wing.topY);
  const [, gy] = projectPoint(VIEW, 0, SIDE.groundY);
  const mx = 233;
  return (
    <g>
      <GroundLine x1={0} x2={240} y={gy} />
      <CarSide view={VIEW} />
      <ExtensionLine x1={wx} y1={wy} x2={mx + 5} y2={wy} />
      <MeasureLine x1={mx} y1={gy} x2={mx} y2={wy} />
      <PointMark x={wx} y={wy} />
      <DiagramLabel x={wx - 12} y={wy - 6} anchor="end">
        wing top
      </DiagramLabel>
    </g>
  );
}
