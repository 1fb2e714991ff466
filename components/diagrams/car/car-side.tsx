import type { DiagramView } from "../parts/diagram-view";
import { projectPath } from "../parts/project-path";
import { projectLength, projectPoint } from "../parts/project-point";
import { SIDE, SIDE_BODY, SIDE_WINDOW } from "./side-geometry";
import { WingSide } from "./wing-side";

/**
 * Plumbline's generic hatchback in side view, front to the left, with a splitter under the
 * front bumper and (unless `wing` is false) a rear wing on an upright. No ground line: each
 * drawing draws its own, as wide as it needs.
 */
export function CarSide({ view, wing = true }: { view: DiagramView; wing?: boolean }) {
  const wheel = (w: { x: number; y: number; r: number }) => {
    const [cx, cy] = projectPoint(view, w.x, w.y);
    return (
      <g key={w.x}>
        <circle cx={cx} cy={cy} r={projectLength(view, w.r)} className="fill-asphalt-800" />
        <circle
          cx={cx}
          cy={cy}
          r={projectLength(view, w.r * 0.5)}
          strokeWidth={3}
          className="fill-asphalt-300 stroke-asphalt-950"
        />
      </g>
    );
  };
  const s = SIDE.splitter;
  const splitterY = s.topY + s.thickness / 2;
  return (
    <g data-part="car-side">
      <path
        d={projectPath(SIDE_BODY, view)}
        strokeWidth={3}
        strokeLinejoin="round"
        className="fill-white stroke-asphalt-900"
      />
      <path
        d={projectPath(SIDE_WINDOW, view)}
        strokeWidth={3}
        strokeLinejoin="round"
        className="fill-asphalt-200 stroke-asphalt-900"
      />
      <path
        d={projectPath("M 140 60 L 140 83 M 96 88 L 96 124", view)}
        strokeWidth={3}
        className="stroke-asphalt-900"
      />
      <path
        d={projectPath("M 28 100 Q 36 96 46 95 L 45 101 L 28 103 Z", view)}
        strokeWidth={3}
        strokeLinejoin="round"
        className="fill-asphalt-300 stroke-asphalt-900"
      />
      <path
        d={projectPath(`M ${s.frontX} ${splitterY} L ${s.rearX} ${splitterY}`, view)}
        strokeWidth={Math.max(4, projectLength(view, s.thickness))}
        className="stroke-asphalt-950"
      />
      {wheel(SIDE.frontWheel)}
      {wheel(SIDE.rearWheel)}
      {wing ? <WingSide view={view} rearX={SIDE.wing.rearX} topY={SIDE.wing.topY} /> : null}
    </g>
  );
}
