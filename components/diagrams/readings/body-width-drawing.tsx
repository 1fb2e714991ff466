import { CarRear } from "../car/car-rear";
import { END } from "../car/end-geometry";
import { DiagramLabel } from "../parts/diagram-label";
import type { DiagramView } from "../parts/diagram-view";
import { ExtensionLine } from "../parts/extension-line";
import { GroundLine } from "../parts/ground-line";
import { MeasureLine } from "../parts/measure-line";
import { PlumbLine } from "../parts/plumb-line";
import { projectPoint } from "../parts/project-point";

const VIEW: DiagramView = { x: 0, y: -30, scale: 1 };
export const BODY_WIDTH_DRAWING_HEIGHT = 206;

/**
 * Rear view: plumb lines from the widest bodywork on each side mark the floor; the mirrors
 * stick out further and are left out. The reading is between the floor marks.
 */
export function BodyWidthDrawing() {
  const b = END.body;
  const [lx, wy] = projectPoint(VIEW, b.left, b.widestY);
  const [rx] = projectPoint(VIEW, b.right, b.widestY);
  const [, gy] = projectPoint(VIEW, 0, END.groundY);
  const [mirrorX, mirrorY] = projectPoint(VIEW, END.mirrors.left, END.mirrors.topY);
  const my = gy + 24;
  return (
    <g>
      <GroundLine x1={0} x2={240} y={gy} />
      <CarRear view={VIEW} wing="none" />
      <PlumbLine x={lx} top={wy} floor={gy} />
      <PlumbLine x={rx} top={wy} floor={gy} />
      <ExtensionLine x1={lx} y1={gy + 6} x2={lx} y2={my + 8} />
      <ExtensionLine x1={rx} y1={gy + 6} x2={rx} y2={my + 8} />
      <MeasureLine x1={lx} y1={my} x2={rx} y2={my} />
      <path
        d={`M ${mirrorX + 4} ${mirrorY - 3} L ${mirrorX + 4} ${mirrorY - 30}`}
        strokeWidth={3}
        className="stroke-asphalt-800"
      />
      <DiagramLabel x={mirrorX - 6} y={mirrorY - 36} anchor="start">
        mirrors not counted
      </DiagramLabel>
    </g>
  );
}
