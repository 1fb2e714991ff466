import type { DimensionMap } from "../measurement/summarise-dimensions";
import type { LengthDimension } from "../records/record-schema";
import type { DimensionSummary } from "../verdicts/verdict-schema";
import { planLengthMm, type WingPlan } from "./wing-plan-schema";
import { wingSpanFromPartsMm } from "./wing-span-from-parts";

/** The planned span between the end plates' outer faces, in mm (from its parts when given so). */
export function plannedSpanMm(plan: WingPlan): number {
  const span = plan.wing.span;
  if (span.kind === "whole") return planLengthMm(span.span);
  const half = planLengthMm(span.half);
  const plate = planLengthMm(plan.wing.endPlate);
  return wingSpanFromPartsMm([half, half], [plate, plate]);
}

/**
 * A plan as the dimensions a scrutineer would read, each exact (no uncertainty: nothing is
 * measured yet), so the engine's own aero geometry and rules judge it.
 * @param k the rule set's coverage factor, carried for the summaries' shape only (U = k·0 = 0)
 */
export function wingPlanDimensions(plan: WingPlan, k: number): DimensionSummary[] {
  const exact = (dimension: LengthDimension, mean: number): DimensionSummary => ({
    dimension,
    corner: null,
    n: 1,
    mean,
    experimentalStandardDeviation: null,
    typeAStandardUncertainty: 0,
    typeBStandardUncertainty: 0,
    combinedStandardUncertainty: 0,
    expandedUncertainty: 0,
    k,
    readingIds: [],
    disagreements: [],
  });
  const mount = planLengthMm(plan.wing.mount.distance);
  return [
    exact("bodyWidthMm", planLengthMm(plan.car.bodyWidth)),
    exact("roofPeakFromGroundMm", planLengthMm(plan.car.roofHeight)),
    exact("wingSpanMm", plannedSpanMm(plan)),
    exact("endPlateThicknessMm", planLengthMm(plan.wing.endPlate)),
    exact("wingChordMm", planLengthMm(plan.wing.chord)),
    exact("wingTopFromGroundMm", planLengthMm(plan.wing.height)),
    exact("wingOverhangMm", plan.wing.mount.direction === "behind" ? mount : -mount),
  ];
}

/** The same summaries keyed as the engine's geometry reads them. */
export function wingPlanDimensionMap(plan: WingPlan, k: number): DimensionMap {
  return new Map(wingPlanDimensions(plan, k).map((d) => [d.dimension, d]));
}
