import type { Dimension, ReadingPayload } from "../records/record-schema";

/** The car's readings as context for one another: the mean of each dimension (corners apart). */
export type ReadingContext = Partial<Record<Dimension, number>>;

/**
 * The mean of each dimension over a car's effective (non-void) readings, so a new reading can be
 * checked against the car's others ("a wing top below half the roof peak's height"). Corner
 * weights are left out: no other dimension is judged by them. The phone and the engine both build
 * it from the readings they hold.
 */
export function readingContext(
  readings: ReadonlyArray<{ payload: ReadingPayload }>,
): ReadingContext {
  const sums = new Map<Dimension, { sum: number; n: number }>();
  for (const { payload } of readings) {
    if (payload.dimension === "cornerWeightKg") continue;
    const s = sums.get(payload.dimension) ?? { sum: 0, n: 0 };
    sums.set(payload.dimension, { sum: s.sum + payload.value, n: s.n + 1 });
  }
  const context: ReadingContext = {};
  for (const [d, { sum, n }] of sums) context[d] = sum / n;
  return context;
}
