import { CarSide } from "../car/car-side";
import { SIDE } from "../car/side-geometry";
import { DiagramLabel } from "../parts/diagram-label";
import type { DiagramView } from "../parts/diagram-view";
import { ExtensionLine } from "../parts/extension-line";
import { GroundLine } from "../parts/ground-line";
import { MeasureLine } from "../parts/measure-line";
import { PlumbLine } from "../parts/plumb-line";
import { PointMark } from "../parts/point-mark";
import { projectPoint } from "../parts/project-point";

const VIEW: DiagramView = { x: -8, y: 86, scale: 2.6 };
export const SPLITTER_PROTRUSION_DRAWING_HEIGHT = 150;

/**
 * Side view of the nose, close up: a plumb line from the bumper's foremost point marks the
 * splitter's top; the reading runs from that mark forward to the splitter's front edge.
 */
export function SplitterProtrusionDrawing() {
  const s = SIDE.splitter;
  const [bx, by] = projectPoint(VIEW, SIDE.bumperFront.x, SIDE.bumperFront.y);
  const [fx, sy] = projectPoint(VIEW, s.frontX, s.topY);
  const [, gy] = projectPoint(VIEW, 0, SIDE.groundY);
  const my = sy - 30;
  return (
    <g>
      <GroundLine x1={0} x2={240} y={gy} />
      <CarSide view={VIEW} />
      <PlumbLine x={bx} top={by} floor={sy} mark={false} />
      <PointMark x={bx} y={by} />
      <ExtensionLine x1={fx} y1={sy - 2} x2={fx} y2={my - 8} />
      <MeasureLine x1={fx} y1={my} x2={bx} y2={my} />
      <DiagramLabel x={bx - 12} y={by - 10} anchor="end">
        bumper
      </DiagramLabel>
      <DiagramLabel x={fx} y={gy - 4} anchor="start">
        splitter
      </DiagramLabel>
    </g>
  );
}
