/** One reading as the disagreement check needs it. */
export type IdentifiedReading = { recordId: string; value: number; standardUncertainty: number };

/** Two readings of one dimension further apart than their uncertainties allow. */
export type Disagreement = {
  firstRecordId: string;
  secondRecordId: string;
  /** |x₁ − x₂|, in the dimension's unit. */
  difference: number;
  /** k·√(u₁² + u₂²): the expanded uncertainty of the difference. */
  allowedDifference: number;
};

/**
 * Finds every pair of readings of one dimension that differ by more than their combined
 * expanded uncertainty, k·√(u₁² + u₂²). The code flags; the chief scrutineer resolves.
 * Pairs come out ordered by record id, so the result does not depend on input order.
 */
export function findDisagreements(
  readings: ReadonlyArray<IdentifiedReading>,
  k: number,
): Disagreement[] {
  const sorted = [...readings].sort((a, b) =>
    a.recordId < b.recordId ? -1 : a.recordId > b.recordId ? 1 : 0,
  );
  const found: Disagreement[] = [];
  for (let i = 0; i < sorted.length; i += 1) {
    const a = sorted[i];
    if (a === undefined) continue;
    for (let j = i + 1; j < sorted.length; j += 1) {
      const b = sorted[j];
      if (b === undefined) continue;
      const difference = Math.abs(a.value - b.value);
      const allowed = k * Math.sqrt(a.standardUncertainty ** 2 + b.standardUncertainty ** 2);
      // Differences within binary noise of the allowance (1e-12 relative) are not disagreements.
      if (
        difference > allowed &&
        difference - allowed > 1e-12 * Math.max(1, Math.abs(a.value), Math.abs(b.value))
      ) {
        found.push({
          firstRecordId: a.recordId,
          secondRecordId: b.recordId,
          difference,
          allowedDifference: allowed,
        });
      }
    }
  }
  return found;
}
