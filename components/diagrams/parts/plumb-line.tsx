import { FloorMark } from "./floor-mark";

/**
 * A plumb line hanging from a point of the car to the floor: dashed string, a bob just clear
 * of the floor, and the chalk cross it points at. Coordinates in SVG units.
 */
export function PlumbLine({
  x,
  top,
  floor,
  mark = true,
}: {
  x: number;
  top: number;
  floor: number;
  /** Draw the floor cross; off when the bob points at something other than the floor. */
  mark?: boolean;
}) {
  const bobTop = floor - 15;
  return (
    <g>
      <circle cx={x} cy={top} r={3.5} className="fill-asphalt-950" />
      <line
        x1={x}
        y1={top}
        x2={x}
        y2={bobTop}
        strokeWidth={3}
        strokeDasharray="5 4"
        className="stroke-asphalt-800"
      />
      <path
        d={`M ${x - 5} ${bobTop} L ${x + 5} ${bobTop} L ${x} ${floor - 4} Z`}
        className="fill-asphalt-950"
      />
      {mark ? <FloorMark x={x} y={floor} /> : null}
    </g>
  );
}
