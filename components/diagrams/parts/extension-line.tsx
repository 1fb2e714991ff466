/** A light dashed guide carrying a point of the car out to its measuring line. */
export function ExtensionLine({
  x1,
  y1,
  x2,
  y2,
}: {
  x1: number;
  y1: number;
  x2: number;
  y2: number;
}) {
  return (
    <line
      x1={x1}
      y1={y1}
      x2={x2}
      y2={y2}
      strokeWidth={3}
      strokeDasharray="4 4"
      className="stroke-asphalt-500"
    />
  );
}
