import { CarRear } from "../car/car-rear";
import { END } from "../car/end-geometry";
import { DiagramLabel } from "../parts/diagram-label";
import type { DiagramView } from "../parts/diagram-view";
import { ExtensionLine } from "../parts/extension-line";
import { MeasureLine } from "../parts/measure-line";
import { projectPoint } from "../parts/project-point";

const VIEW: DiagramView = { x: 161, y: -4, scale: 4.5 };
export const END_PLATE_DRAWING_HEIGHT = 190;

/** Rear view, close up on the right-hand end plate: inner face to outer face. */
export function EndPlateDrawing() {
  const w = END.wing;
  const outer = END.centreX + w.halfSpan;
  const [ox, top] = projectPoint(VIEW, outer, w.topY);
  const [ix] = projectPoint(VIEW, outer - w.plateThickness, w.topY);
  const [, bottom] = projectPoint(VIEW, outer, w.topY + w.plateHeight);
  const my = top - 22;
  return (
    <g>
      <CarRear view={VIEW} />
      <line x1={ix} y1={top} x2={ix} y2={bottom} strokeWidth={4} className="stroke-accent" />
      <line x1={ox} y1={top} x2={ox} y2={bottom} strokeWidth={4} className="stroke-accent" />
      <ExtensionLine x1={ix} y1={top - 4} x2={ix} y2={my - 8} />
      <ExtensionLine x1={ox} y1={top - 4} x2={ox} y2={my - 8} />
      <MeasureLine x1={ix} y1={my} x2={ox} y2={my} ends="arrows-outside" />
      <DiagramLabel x={(ix + ox) / 2} y={my - 14} anchor="middle" tone="accent">
        thickness
      </DiagramLabel>
      <DiagramLabel x={ix - 10} y={bottom + 2} anchor="end">
        inner face
      </DiagramLabel>
      <DiagramLabel x={ox + 10} y={bottom - 30} anchor="start">
        outer
      </DiagramLabel>
      <DiagramLabel x={ox + 10} y={bottom - 10} anchor="start">
        face
      </DiagramLabel>
    </g>
  );
}
