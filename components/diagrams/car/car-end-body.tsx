import type { DiagramView } from "../parts/diagram-view";
import { projectPath } from "../parts/project-path";
import { END, END_BODY, END_GLASS, END_GREENHOUSE } from "./end-geometry";

/** What the rear and front views share: tyres, body, mirrors, greenhouse and glass. */
export function CarEndBody({ view }: { view: DiagramView }) {
  const { tyres, mirrors, body, groundY } = END;
  const tyre = (x: number) =>
    `M ${x} ${tyres.topY} L ${x + tyres.width} ${tyres.topY} L ${x + tyres.width} ${groundY} L ${x} ${groundY} Z`;
  const mirror = (outer: number, inner: number) =>
    `M ${inner} ${body.topY - 2} L ${inner} ${mirrors.bottomY} L ${outer} ${mirrors.bottomY} ` +
    `L ${outer} ${mirrors.topY} L ${inner} ${mirrors.topY + 2} Z`;
  return (
    <g data-part="car-end">
      <path
        d={projectPath(`${tyre(tyres.left)} ${tyre(tyres.right - tyres.width)}`, view)}
        className="fill-asphalt-800"
      />
      <path
        d={projectPath(`${mirror(mirrors.left, 44)} ${mirror(mirrors.right, 196)}`, view)}
        strokeWidth={3}
        strokeLinejoin="round"
        className="fill-asphalt-300 stroke-asphalt-900"
      />
      <path
        d={projectPath(END_GREENHOUSE, view)}
        strokeWidth={3}
        strokeLinejoin="round"
        className="fill-white stroke-asphalt-900"
      />
      <path
        d={projectPath(END_GLASS, view)}
        strokeWidth={3}
        strokeLinejoin="round"
        className="fill-asphalt-200 stroke-asphalt-900"
      />
      <path
        d={projectPath(END_BODY, view)}
        strokeWidth={3}
        strokeLinejoin="round"
        className="fill-white stroke-asphalt-900"
      />
    </g>
  );
}
