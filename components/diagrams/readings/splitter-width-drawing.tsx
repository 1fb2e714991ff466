import { CarFront } from "../car/car-front";
import { END } from "../car/end-geometry";
import { DiagramLabel } from "../parts/diagram-label";
import type { DiagramView } from "../parts/diagram-view";
import { ExtensionLine } from "../parts/extension-line";
import { GroundLine } from "../parts/ground-line";
import { MeasureLine } from "../parts/measure-line";
import { projectPoint } from "../parts/project-point";

const VIEW: DiagramView = { x: 0, y: -8, scale: 1 };
export const SPLITTER_WIDTH_DRAWING_HEIGHT = 184;

/** Front view: across the splitter from one side edge to the other. */
export function SplitterWidthDrawing() {
  const s = END.splitter;
  const [lx, sy] = projectPoint(VIEW, s.left, s.topY + s.thickness / 2);
  const [rx] = projectPoint(VIEW, s.right, s.topY);
  const [, gy] = projectPoint(VIEW, 0, END.groundY);
  const my = gy + 24;
  return (
    <g>
      <GroundLine x1={0} x2={240} y={gy} />
      <CarFront view={VIEW} />
      <line x1={lx} y1={sy} x2={rx} y2={sy} strokeWidth={5} className="stroke-accent" />
      <ExtensionLine x1={lx} y1={sy + 4} x2={lx} y2={my + 8} />
      <ExtensionLine x1={rx} y1={sy + 4} x2={rx} y2={my + 8} />
      <MeasureLine x1={lx} y1={my} x2={rx} y2={my} />
      <DiagramLabel x={120} y={my - 8} anchor="middle" tone="accent">
        splitter
      </DiagramLabel>
    </g>
  );
}
