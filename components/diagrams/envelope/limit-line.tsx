/** A class limit drawn as a boundary: a heavy dashed line in ink (the state colours are for
 * where the car stands, not for the rule). */
export function LimitLine({ x1, y1, x2, y2 }: { x1: number; y1: number; x2: number; y2: number }) {
  return (
    <line
      x1={x1}
      y1={y1}
      x2={x2}
      y2={y2}
      strokeWidth={4}
      strokeDasharray="12 6"
      className="stroke-asphalt-950"
      data-part="limit"
    />
  );
}
