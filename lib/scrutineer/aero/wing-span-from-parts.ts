/**
 * A wing's span from its parts, end plates counted: the sum of the element widths and the
 * end plates' thicknesses (two 32 in halves + two 1/4 in plates = 64.5 in). For an entrant's
 * pre-check; at the tech line the span is read between the end plates' outer faces.
 * @param elementWidthsMm widths of the wing elements side by side, in mm
 * @param endPlateThicknessesMm thickness of each end plate, in mm
 */
export function wingSpanFromPartsMm(
  elementWidthsMm: ReadonlyArray<number>,
  endPlateThicknessesMm: ReadonlyArray<number>,
): number {
  const all = [...elementWidthsMm, ...endPlateThicknessesMm];
  if (all.some((v) => !Number.isFinite(v) || v < 0)) {
    throw new RangeError("Widths and thicknesses must be finite and not negative");
  }
  return all.reduce((sum, v) => sum + v, 0);
}
