import type { DiagramView } from "../parts/diagram-view";
import { projectPath } from "../parts/project-path";
import { hatchYAt, WING_SIDE } from "./side-geometry";

/**
 * The rear wing in side view: the near end plate as an outline (the wing's highest and
 * rearmost point is its top-rear corner), the element's profile and the upright to the hatch.
 * `ghost` draws it dashed and grey, for a wing whose place is not measured yet.
 */
export function WingSide({
  view,
  rearX,
  topY,
  ghost = false,
}: {
  view: DiagramView;
  rearX: number;
  topY: number;
  ghost?: boolean;
}) {
  const w = WING_SIDE;
  const le = { x: rearX + w.leadingEdge.dx, y: topY + w.leadingEdge.dy };
  const te = { x: rearX + w.trailingEdge.dx, y: topY + w.trailingEdge.dy };
  const element =
    `M ${le.x} ${le.y} Q ${le.x + 3} ${topY + 9} ${rearX - 20} ${topY + 8} L ${te.x} ${te.y - 1} ` +
    `L ${te.x} ${te.y + 1.5} Q ${rearX - 20} ${topY + 14} ${le.x + 1} ${le.y + 2} Z`;
  const left = rearX - w.plateLength;
  const bottom = topY + w.plateHeight;
  const plate =
    `M ${left + 4} ${topY} L ${rearX - 4} ${topY} Q ${rearX} ${topY} ${rearX} ${topY + 4} ` +
    `L ${rearX} ${bottom - 4} Q ${rearX} ${bottom} ${rearX - 4} ${bottom} L ${left + 4} ${bottom} ` +
    `Q ${left} ${bottom} ${left} ${bottom - 4} L ${left} ${topY + 4} Q ${left} ${topY} ${left + 4} ${topY} Z`;
  const ux = rearX + w.upright.dx;
  const uy = topY + w.upright.dy;
  // Keep the mount on the hatch even when the envelope pushes the wing far back.
  const mountX = Math.min(rearX + w.upright.mountDx, 200);
  const mountY = hatchYAt(mountX);
  const upright = mountY > uy ? `M ${ux} ${uy} L ${mountX} ${mountY}` : null;
  const line = ghost ? "stroke-asphalt-500" : "stroke-asphalt-900";
  const dash = ghost ? "6 4" : undefined;
  return (
    <g data-part="wing">
      {upright ? (
        <path
          d={projectPath(upright, view)}
          strokeWidth={5}
          strokeLinecap="round"
          strokeDasharray={dash}
          className={line}
        />
      ) : null}
      <path
        d={projectPath(plate, view)}
        strokeWidth={3}
        strokeDasharray={dash}
        className={`fill-white ${ghost ? line : "stroke-asphalt-700"}`}
      />
      <path
        d={projectPath(element, view)}
        strokeWidth={3}
        strokeLinejoin="round"
        strokeDasharray={dash}
        className={
          ghost ? "fill-asphalt-200 stroke-asphalt-500" : "fill-asphalt-800 stroke-asphalt-900"
        }
      />
    </g>
  );
}
