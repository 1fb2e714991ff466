import { CORNERS } from "@/lib/scrutineer/records/record-schema";
import type { DiagramView } from "../parts/diagram-view";
import { projectPath } from "../parts/project-path";
import { TOP, TOP_BODY, TOP_GLASS, TOP_ROOF, wheelCentre } from "./top-geometry";

/** The hatchback from above, front at the top: body, glass, roof, wheels, mirrors, wing, pipe. */
export function CarTop({ view }: { view: DiagramView }) {
  const w = TOP.wheel;
  const wheels = CORNERS.map((corner) => {
    const { x, y } = wheelCentre(corner);
    const l = x - w.width / 2;
    const t = y - w.length / 2;
    return `M ${l} ${t} L ${l + w.width} ${t} L ${l + w.width} ${t + w.length} L ${l} ${t + w.length} Z`;
  }).join(" ");
  const o = TOP.outlet;
  return (
    <g data-part="car-top">
      <path d={projectPath(wheels, view)} className="fill-asphalt-800" />
      <path
        d={projectPath(`M ${o.x} 214 L ${o.x} ${o.y}`, view)}
        strokeWidth={7}
        className="stroke-asphalt-700"
      />
      <path
        d={projectPath(
          "M 72 90 L 60 94 L 60 102 L 72 100 Z M 168 90 L 180 94 L 180 102 L 168 100 Z",
          view,
        )}
        strokeWidth={3}
        strokeLinejoin="round"
        className="fill-asphalt-300 stroke-asphalt-900"
      />
      <path
        d={projectPath(TOP_BODY, view)}
        strokeWidth={3}
        strokeLinejoin="round"
        className="fill-white stroke-asphalt-900"
      />
      <path
        d={projectPath(TOP_GLASS, view)}
        strokeWidth={3}
        strokeLinejoin="round"
        className="fill-asphalt-200 stroke-asphalt-900"
      />
      <path
        d={projectPath(TOP_ROOF, view)}
        strokeWidth={3}
        strokeLinejoin="round"
        className="fill-white stroke-asphalt-900"
      />
      <path
        d={projectPath("M 80 200 L 160 200 L 160 210 L 80 210 Z", view)}
        strokeWidth={3}
        className="fill-asphalt-700 stroke-asphalt-900"
      />
      <path
        d={projectPath("M 96 186 L 96 200 M 144 186 L 144 200", view)}
        strokeWidth={4}
        className="stroke-asphalt-900"
      />
    </g>
  );
}
