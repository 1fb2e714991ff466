import { combineReadings } from "./combine-readings";

/** One reading as the disagreement check needs it: who took it, the value and the instrument. */
export type OfficialReading = {
  recordId: string;
  officialId: string;
  value: number;
  /** The instrument's stated standard uncertainty (Type B), same unit as `value`. */
  standardUncertainty: number;
  instrumentId: string;
};

/** One official's readings of a dimension, combined: their mean and its combined uncertainty. */
export type OfficialValue = {
  officialId: string;
  recordIds: string[];
  n: number;
  mean: number;
  /** u_c of the mean: the official's own Type A (s/√n) with the instruments' Type B (GUM §5.1.2). */
  combinedStandardUncertainty: number;
};

/** Two officials' values of one dimension further apart than their uncertainties allow. */
export type Disagreement = {
  first: OfficialValue;
  second: OfficialValue;
  /** |x₁ − x₂|, in the dimension's unit. */
  difference: number;
  /** k·√(u₁² + u₂²): the expanded uncertainty of the difference. */
  allowedDifference: number;
};

const byText = (a: string, b: string) => (a < b ? -1 : a > b ? 1 : 0);

/**
 * Compares what different officials read for one dimension. Each official's readings are
 * combined first (mean, Type A s/√n and Type B from the instruments — JCGM 100:2008 §4), so one
 * official's repeated readings are a sample, never a disagreement. Then every pair of officials
 * whose values differ by more than k·√(u₁² + u₂²) is a disagreement: the code flags it, the chief
 * scrutineer resolves it. The officials' instruments are taken as independent. Pairs come out
 * ordered by official id, so the result does not depend on the order of the readings.
 */
export function findDisagreements(
  readings: ReadonlyArray<OfficialReading>,
  k: number,
): Disagreement[] {
  const byOfficial = new Map<string, OfficialReading[]>();
  for (const r of readings) {
    const list = byOfficial.get(r.officialId);
    if (list) list.push(r);
    else byOfficial.set(r.officialId, [r]);
  }
  const values: OfficialValue[] = [];
  for (const officialId of [...byOfficial.keys()].sort(byText)) {
    const own = byOfficial.get(officialId) ?? [];
    const combined = combineReadings(own, k);
    if (combined === null) continue;
    values.push({
      officialId,
      recordIds: own.map((r) => r.recordId).sort(byText),
      n: combined.n,
      mean: combined.mean,
      combinedStandardUncertainty: combined.combinedStandardUncertainty,
    });
  }
  const found: Disagreement[] = [];
  for (let i = 0; i < values.length; i += 1) {
    const a = values[i];
    if (a === undefined) continue;
    for (let j = i + 1; j < values.length; j += 1) {
      const b = values[j];
      if (b === undefined) continue;
      const difference = Math.abs(a.mean - b.mean);
      const allowed =
        k * Math.sqrt(a.combinedStandardUncertainty ** 2 + b.combinedStandardUncertainty ** 2);
      // Differences within binary noise of the allowance (1e-12 relative) are not disagreements.
      if (
        difference > allowed &&
        difference - allowed > 1e-12 * Math.max(1, Math.abs(a.mean), Math.abs(b.mean))
      ) {
        found.push({ first: a, second: b, difference, allowedDifference: allowed });
      }
    }
  }
  return found;
}
