/** A chalk cross on the floor where a plumb bob points. */
export function FloorMark({ x, y }: { x: number; y: number }) {
  const s = 5;
  return (
    <path
      d={`M ${x - s} ${y - s} L ${x + s} ${y + s} M ${x - s} ${y + s} L ${x + s} ${y - s}`}
      strokeWidth={3}
      strokeLinecap="round"
      className="stroke-asphalt-950"
    />
  );
}
