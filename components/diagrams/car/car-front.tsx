import type { DiagramView } from "../parts/diagram-view";
import { projectPath } from "../parts/project-path";
import { projectLength } from "../parts/project-point";
import { CarEndBody } from "./car-end-body";
import { END } from "./end-geometry";

/**
 * The hatchback from the front: lamps, grille and the splitter under the bumper. The wing is
 * behind the roof and left out, so the splitter reading stands alone.
 */
export function CarFront({ view }: { view: DiagramView }) {
  const s = END.splitter;
  const y = s.topY + s.thickness / 2;
  return (
    <g data-part="car-front">
      <CarEndBody view={view} />
      <path
        d={projectPath(
          "M 46 86 L 74 88 L 72 97 L 44 95 Z M 166 88 L 194 86 L 196 95 L 168 97 Z " +
            "M 90 100 L 150 100 L 146 114 L 94 114 Z",
          view,
        )}
        strokeWidth={3}
        strokeLinejoin="round"
        className="fill-asphalt-300 stroke-asphalt-900"
      />
      <path
        d={projectPath(`M ${s.left} ${y} L ${s.right} ${y}`, view)}
        strokeWidth={Math.max(4, projectLength(view, s.thickness))}
        className="stroke-asphalt-950"
      />
    </g>
  );
}
