/** The level pad: a firm line with a light band under it, in SVG units. */
export function GroundLine({ x1, x2, y }: { x1: number; x2: number; y: number }) {
  return (
    <g>
      <rect x={x1} y={y} width={x2 - x1} height={8} className="fill-asphalt-200" />
      <line x1={x1} y1={y} x2={x2} y2={y} strokeWidth={3} className="stroke-asphalt-900" />
    </g>
  );
}
