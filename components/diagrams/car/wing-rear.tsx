import type { DiagramView } from "../parts/diagram-view";
import { projectPath } from "../parts/project-path";
import { END } from "./end-geometry";

/**
 * The rear wing seen from behind (or, ghosted, from the front): element between two end plates
 * on two uprights. `halfSpan` is from the centre line to an end plate's outer face, in the
 * car's units, so the class envelope can set the span it draws.
 */
export function WingRear({
  view,
  halfSpan = END.wing.halfSpan,
  tone = "solid",
}: {
  view: DiagramView;
  halfSpan?: number;
  /** ghost: light, for drawings about something else; dashed: not measured yet. */
  tone?: "solid" | "ghost" | "dashed";
}) {
  const c = END.centreX;
  const w = END.wing;
  const t = w.plateThickness;
  const bottom = w.topY + w.plateHeight;
  const plate = (outer: number, inner: number) =>
    `M ${outer} ${w.topY} L ${inner} ${w.topY} L ${inner} ${bottom} L ${outer} ${bottom} Z`;
  const element =
    `M ${c - halfSpan + t} ${w.elementTopY} L ${c + halfSpan - t} ${w.elementTopY} ` +
    `L ${c + halfSpan - t} ${w.elementTopY + 7} L ${c - halfSpan + t} ${w.elementTopY + 7} Z`;
  const uprights =
    `M ${c - END.uprightOffset} ${w.elementTopY + 7} L ${c - END.uprightOffset} ${END.body.topY} ` +
    `M ${c + END.uprightOffset} ${w.elementTopY + 7} L ${c + END.uprightOffset} ${END.body.topY}`;
  const line = tone === "solid" ? "stroke-asphalt-900" : "stroke-asphalt-400";
  const fill = tone === "solid" ? "fill-asphalt-800" : "fill-asphalt-100";
  const dash = tone === "dashed" ? "6 4" : undefined;
  return (
    <g data-part="wing">
      <path
        d={projectPath(uprights, view)}
        strokeWidth={5}
        strokeDasharray={dash}
        className={line}
      />
      <path
        d={projectPath(element, view)}
        strokeWidth={3}
        strokeDasharray={dash}
        className={`${fill} ${line}`}
      />
      <path
        d={projectPath(
          `${plate(c - halfSpan, c - halfSpan + t)} ${plate(c + halfSpan, c + halfSpan - t)}`,
          view,
        )}
        strokeWidth={3}
        strokeDasharray={dash}
        className={`${tone === "solid" ? "fill-asphalt-500" : "fill-white"} ${line}`}
      />
    </g>
  );
}
