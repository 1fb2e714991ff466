/** A straight-edge (steel rule or level bar), drawn as a bar between two corners. */
export function StraightEdge({
  x,
  y,
  width,
  height,
}: {
  x: number;
  y: number;
  width: number;
  height: number;
}) {
  return (
    <rect
      x={x}
      y={y}
      width={width}
      height={height}
      rx={1.5}
      strokeWidth={3}
      className="fill-asphalt-300 stroke-asphalt-900"
    />
  );
}
