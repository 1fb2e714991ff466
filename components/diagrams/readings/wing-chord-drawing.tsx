import { SIDE, WING_SIDE } from "../car/side-geometry";
import { WingSide } from "../car/wing-side";
import { DiagramLabel } from "../parts/diagram-label";
import type { DiagramView } from "../parts/diagram-view";
import { ExtensionLine } from "../parts/extension-line";
import { MeasureLine } from "../parts/measure-line";
import { projectPoint } from "../parts/project-point";

const VIEW: DiagramView = { x: 162.1, y: 7.4, scale: 2.8 };
export const WING_CHORD_DRAWING_HEIGHT = 166;

/**
 * Side view, close up on the wing: straight from the element's leading edge to its trailing
 * edge, measured along the chord (so the element's angle does not shorten it).
 */
export function WingChordDrawing() {
  const w = SIDE.wing;
  const [lx, ly] = projectPoint(
    VIEW,
    w.rearX + WING_SIDE.leadingEdge.dx,
    w.topY + WING_SIDE.leadingEdge.dy,
  );
  const [tx, ty] = projectPoint(
    VIEW,
    w.rearX + WING_SIDE.trailingEdge.dx,
    w.topY + WING_SIDE.trailingEdge.dy,
  );
  // The measuring line runs parallel to the chord, lifted clear of the element.
  const length = Math.hypot(tx - lx, ty - ly);
  const nx = (ty - ly) / length;
  const ny = -(tx - lx) / length;
  const lift = 24;
  const a = { x: lx + nx * lift, y: ly + ny * lift };
  const b = { x: tx + nx * lift, y: ty + ny * lift };
  return (
    <g>
      {/* The wing alone: the body would only cross the labels at this zoom. */}
      <WingSide view={VIEW} rearX={w.rearX} topY={w.topY} />
      <ExtensionLine x1={lx + nx * 6} y1={ly + ny * 6} x2={a.x + nx * 8} y2={a.y + ny * 8} />
      <ExtensionLine x1={tx + nx * 6} y1={ty + ny * 6} x2={b.x + nx * 8} y2={b.y + ny * 8} />
      <MeasureLine x1={a.x} y1={a.y} x2={b.x} y2={b.y} />
      <circle cx={lx} cy={ly} r={5} strokeWidth={3} className="fill-white stroke-accent" />
      <circle cx={tx} cy={ty} r={5} strokeWidth={3} className="fill-white stroke-accent" />
      <path d="M 4 14 L 16 7 L 16 21 Z" className="fill-asphalt-950" />
      <line x1={14} y1={14} x2={34} y2={14} strokeWidth={4} className="stroke-asphalt-950" />
      <DiagramLabel x={40} y={20} anchor="start">
        front
      </DiagramLabel>
      <path
        d={`M 30 120 L ${lx - 5} ${ly + 5} M 206 46 L ${tx + 5} ${ty - 4}`}
        strokeWidth={3}
        className="stroke-asphalt-800"
      />
      <DiagramLabel x={4} y={138}>
        leading
      </DiagramLabel>
      <DiagramLabel x={4} y={158}>
        edge
      </DiagramLabel>
      <DiagramLabel x={236} y={22} anchor="end">
        trailing
      </DiagramLabel>
      <DiagramLabel x={236} y={42} anchor="end">
        edge
      </DiagramLabel>
    </g>
  );
}
