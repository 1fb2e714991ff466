import { CarSide } from "../car/car-side";
import { SIDE, WING_SIDE } from "../car/side-geometry";
import { DiagramLabel } from "../parts/diagram-label";
import type { DiagramView } from "../parts/diagram-view";
import { ExtensionLine } from "../parts/extension-line";
import { GroundLine } from "../parts/ground-line";
import { MeasureLine } from "../parts/measure-line";
import { PlumbLine } from "../parts/plumb-line";
import { projectPoint } from "../parts/project-point";

const VIEW: DiagramView = { x: 104, y: 14, scale: 1.8 };
export const WING_OVERHANG_DRAWING_HEIGHT = 262;

/**
 * Side view of the rear, close up: a plumb line from the wing's rearmost point and one from the
 * rearmost bodywork each mark the floor; the reading is the distance between the marks.
 */
export function WingOverhangDrawing() {
  const w = SIDE.wing;
  const [wx, wy] = projectPoint(VIEW, w.rearX, w.topY + WING_SIDE.plateHeight / 2);
  const b = SIDE.bumperRear;
  const [bx, by] = projectPoint(VIEW, b.x, (b.y + b.bottomY) / 2);
  const [, gy] = projectPoint(VIEW, 0, SIDE.groundY);
  const my = gy + 24;
  return (
    <g>
      <GroundLine x1={0} x2={240} y={gy} />
      <CarSide view={VIEW} />
      <PlumbLine x={wx} top={wy} floor={gy} />
      <PlumbLine x={bx} top={by} floor={gy} />
      <ExtensionLine x1={bx} y1={gy + 6} x2={bx} y2={my + 8} />
      <ExtensionLine x1={wx} y1={gy + 6} x2={wx} y2={my + 8} />
      <MeasureLine x1={bx} y1={my} x2={wx} y2={my} ends="arrows-outside" />
      <DiagramLabel x={bx - 30} y={my + 6} anchor="end" tone="accent">
        + wing behind
      </DiagramLabel>
    </g>
  );
}
