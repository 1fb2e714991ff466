/** One reading as the combination needs it. */
export type ReadingValue = {
  value: number;
  /** The instrument's stated standard uncertainty (Type B), same unit as `value`. */
  standardUncertainty: number;
  instrumentId: string;
};

/** The combined result for one dimension (GUM, JCGM 100:2008). */
export type CombinedReading = {
  n: number;
  mean: number;
  /** Experimental standard deviation s of the readings (GUM 4.2.2); null for one reading. */
  experimentalStandardDeviation: number | null;
  /** Type A: s/√n (GUM 4.2.3); 0 for a single reading, whose spread is unknown. */
  typeAStandardUncertainty: number;
  /** Type B from the instruments' stated uncertainties (GUM 4.3). */
  typeBStandardUncertainty: number;
  /** u_c = √(u_A² + u_B²) (GUM 5.1.2, sensitivity 1). */
  combinedStandardUncertainty: number;
  /** U = k·u_c (GUM 6.2.1). */
  expandedUncertainty: number;
  k: number;
};

/**
 * Combines repeated readings of one dimension (by one or several scrutineers) into the mean,
 * a Type A uncertainty s/√n and a Type B uncertainty from the instruments, expanded with k.
 *
 * Type B: an instrument's error is taken as fully correlated between its own readings (the same
 * tape reads the same way), and independent between instruments. With n_j of n readings on
 * instrument j of stated u_j, u_B = √Σ_j (n_j/n · u_j)²; one instrument gives u_B = u_j.
 * Readings are summed in value order so the result does not depend on the order given.
 * @returns null when there are no readings
 */
export function combineReadings(
  readings: ReadonlyArray<ReadingValue>,
  k: number,
): CombinedReading | null {
  const n = readings.length;
  if (n === 0) return null;
  const values = readings.map((r) => r.value).sort((a, b) => a - b);
  const mean = values.reduce((sum, v) => sum + v, 0) / n;
  let s: number | null = null;
  if (n > 1) {
    const squares = values.reduce((sum, v) => sum + (v - mean) ** 2, 0);
    s = Math.sqrt(squares / (n - 1));
  }
  const typeA = s === null ? 0 : s / Math.sqrt(n);

  const byInstrument = new Map<string, { count: number; u: number }>();
  for (const r of readings) {
    const seen = byInstrument.get(r.instrumentId);
    // The same instrument stated twice with different u: take the larger (the cautious one).
    byInstrument.set(r.instrumentId, {
      count: (seen?.count ?? 0) + 1,
      u: Math.max(seen?.u ?? 0, r.standardUncertainty),
    });
  }
  const contributions = [...byInstrument.values()]
    .map(({ count, u }) => ((count / n) * u) ** 2)
    .sort((a, b) => a - b);
  const typeB = Math.sqrt(contributions.reduce((sum, c) => sum + c, 0));
  const combined = Math.sqrt(typeA ** 2 + typeB ** 2);
  return {
    n,
    mean,
    experimentalStandardDeviation: s,
    typeAStandardUncertainty: typeA,
    typeBStandardUncertainty: typeB,
    combinedStandardUncertainty: combined,
    expandedUncertainty: k * combined,
    k,
  };
}
