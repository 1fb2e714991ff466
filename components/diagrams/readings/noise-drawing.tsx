import { CarTop } from "../car/car-top";
import { TOP } from "../car/top-geometry";
import { DiagramLabel } from "../parts/diagram-label";
import type { DiagramView } from "../parts/diagram-view";
import { ExtensionLine } from "../parts/extension-line";
import { MeasureLine } from "../parts/measure-line";
import { projectPoint } from "../parts/project-point";

const VIEW: DiagramView = { x: 64, y: 150, scale: 1.5 };
export const NOISE_DRAWING_HEIGHT = 236;
/** Drawn distance from the outlet to the meter, in SVG units (not to scale). */
const REACH = 88;

/**
 * Top view of the rear, close up: the meter 0.5 m from the exhaust outlet, 45° off the line
 * the outlet points along (straight back).
 */
export function NoiseDrawing() {
  const [ox, oy] = projectPoint(VIEW, TOP.outlet.x, TOP.outlet.y);
  const d = REACH / Math.SQRT2;
  const mx = ox + d;
  const my = oy + d;
  const arc = 40;
  return (
    <g>
      <CarTop view={VIEW} />
      <ExtensionLine x1={ox} y1={oy + 4} x2={ox} y2={oy + REACH + 8} />
      <path
        d={`M ${ox - 12} ${oy + 10} Q ${ox} ${oy + 20} ${ox + 12} ${oy + 10}`}
        strokeWidth={3}
        className="fill-none stroke-asphalt-500"
      />
      <path
        d={`M ${ox} ${oy + arc} A ${arc} ${arc} 0 0 0 ${ox + arc / Math.SQRT2} ${oy + arc / Math.SQRT2}`}
        strokeWidth={3}
        className="fill-none stroke-asphalt-900"
      />
      <DiagramLabel x={ox + 14} y={oy + arc + 18} anchor="start">
        45°
      </DiagramLabel>
      <MeasureLine x1={ox + 4} y1={oy + 4} x2={mx - 8} y2={my - 8} />
      <DiagramLabel x={ox + d / 2 + 12} y={oy + d / 2 - 4} anchor="start" tone="accent">
        0.5 m
      </DiagramLabel>
      <g transform={`translate(${mx} ${my}) rotate(-45)`}>
        <rect x={-9} y={2} width={18} height={32} rx={4} className="fill-asphalt-800" />
        <rect x={-5} y={7} width={10} height={8} rx={1} className="fill-asphalt-200" />
        <rect x={-3} y={-5} width={6} height={8} className="fill-asphalt-600" />
        <circle cx={0} cy={-8} r={5} className="fill-asphalt-950" />
      </g>
      <DiagramLabel x={mx - 4} y={my + 46} anchor="middle">
        meter
      </DiagramLabel>
      <DiagramLabel x={ox - 12} y={oy + 8} anchor="end">
        outlet
      </DiagramLabel>
    </g>
  );
}
