/** How far apart two different values may be drawn, in SVG units, and how mm map to units. */
export type AxisScale = { unitsPerMm: number; minGap: number; maxGap: number };

/**
 * Places values along one axis of a drawing that is not to scale but keeps the order: the
 * anchor value sits at 0, and each step between neighbouring values is drawn as its true size
 * clamped to [minGap, maxGap]. So a wing 2 mm over its limit is still visibly beyond the line,
 * a wing 300 mm inside does not run off the drawing, and equal values land on the same spot.
 * @returns position of each given value, in units, positive in the direction of larger values
 */
export function placeOnAxis(
  anchorMm: number,
  valuesMm: ReadonlyArray<number>,
  scale: AxisScale,
): (valueMm: number) => number {
  const sorted = [...new Set([anchorMm, ...valuesMm])].sort((a, b) => a - b);
  const at = sorted.indexOf(anchorMm);
  const positions = new Map<number, number>([[anchorMm, 0]]);
  const gap = (a: number, b: number) =>
    Math.min(scale.maxGap, Math.max(scale.minGap, Math.abs(b - a) * scale.unitsPerMm));
  for (let i = at + 1; i < sorted.length; i++) {
    const prev = sorted[i - 1] ?? anchorMm;
    const value = sorted[i] ?? anchorMm;
    positions.set(value, (positions.get(prev) ?? 0) + gap(prev, value));
  }
  for (let i = at - 1; i >= 0; i--) {
    const next = sorted[i + 1] ?? anchorMm;
    const value = sorted[i] ?? anchorMm;
    positions.set(value, (positions.get(next) ?? 0) - gap(value, next));
  }
  return (valueMm: number) => {
    const position = positions.get(valueMm);
    if (position === undefined) throw new Error(`placeOnAxis: ${valueMm} mm was not placed`);
    return position;
  };
}
