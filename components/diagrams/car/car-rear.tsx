import type { DiagramView } from "../parts/diagram-view";
import { projectPath } from "../parts/project-path";
import { CarEndBody } from "./car-end-body";
import { WingRear } from "./wing-rear";

/**
 * The hatchback from behind: tail lamps, number plate, bumper line and the wing.
 * `wing` ghosts it for drawings about the body, or leaves it off for the class envelope,
 * which draws its own at the span it needs.
 */
export function CarRear({
  view,
  wing = "solid",
}: {
  view: DiagramView;
  wing?: "solid" | "ghost" | "none";
}) {
  return (
    <g data-part="car-rear">
      <CarEndBody view={view} />
      <path
        d={projectPath(
          "M 46 86 L 68 86 L 68 95 L 44 95 Z M 172 86 L 194 86 L 196 95 L 172 95 Z " +
            "M 104 98 L 136 98 L 136 108 L 104 108 Z",
          view,
        )}
        strokeWidth={3}
        strokeLinejoin="round"
        className="fill-asphalt-300 stroke-asphalt-900"
      />
      <path
        d={projectPath("M 42 112 L 198 112", view)}
        strokeWidth={3}
        className="stroke-asphalt-900"
      />
      {wing === "none" ? null : <WingRear view={view} tone={wing} />}
    </g>
  );
}
