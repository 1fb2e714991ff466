import type { DimensionSummary, MeasurandPart } from "../verdicts/verdict-schema";

/** A derived quantity with its combined standard uncertainty and the readings it came from. */
export type Measurand = { value: number; standardUncertainty: number; parts: MeasurandPart[] };

/**
 * A linear combination Σ cᵢ·xᵢ of combined dimensions, with u = √Σ (cᵢ·uᵢ)² — the GUM law of
 * propagation (JCGM 100:2008 §5.1.2) for uncorrelated inputs with sensitivity coefficients cᵢ.
 * E.g. height above roof = 1·wingTop − 1·roofPeak.
 */
export function combineLinear(
  terms: ReadonlyArray<{ coefficient: number; summary: DimensionSummary }>,
): Measurand {
  let value = 0;
  let variance = 0;
  const parts: MeasurandPart[] = [];
  for (const { coefficient, summary } of terms) {
    value += coefficient * summary.mean;
    variance += (coefficient * summary.combinedStandardUncertainty) ** 2;
    parts.push({
      dimension: summary.dimension,
      corner: summary.corner,
      value: summary.mean,
      standardUncertainty: summary.combinedStandardUncertainty,
      n: summary.n,
    });
  }
  return { value, standardUncertainty: Math.sqrt(variance), parts };
}
