// Order statistics the bench reports: percentiles by nearest rank, and min / median / max.

/** The p-th percentile (0–100) by nearest rank; Infinity counts as larger than any time. */
export function percentile(values: readonly number[], p: number): number {
  if (values.length === 0) return Number.NaN;
  const sorted = [...values].sort((a, b) => a - b);
  const rank = Math.max(1, Math.ceil((p / 100) * sorted.length));
  return sorted[rank - 1] ?? Number.NaN;
}

export type Spread = { min: number; median: number; max: number };

/** Min, median (the lower middle one for an even count) and max. */
export function spread(values: readonly number[]): Spread {
  const sorted = [...values].sort((a, b) => a - b);
  return {
    min: sorted[0] ?? Number.NaN,
    median: sorted[Math.floor((sorted.length - 1) / 2)] ?? Number.NaN,
    max: sorted.at(-1) ?? Number.NaN,
  };
}
