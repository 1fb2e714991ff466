import type { DecisionRule } from "../rule-sets/rule-set-schema";
import { conformanceProbability } from "./conformance-probability";

/** Outcome of judging one measured value against one limit. */
export type LimitDecision = {
  outcome: "pass" | "fail" | "inconclusive";
  /** Distance inside the limit (positive) or beyond it (negative), in the value's unit. */
  marginToLimit: number;
  /** U = k·u. */
  expandedUncertainty: number;
  conformanceProbability: number;
  /** Where the decision changes: the limit itself (simple), or the limit moved in by U (guarded). */
  acceptanceLimit: number;
};

/** Relative size below which a difference is binary floating-point noise, not measurement. */
const NOISE = 1e-12;

/**
 * Judges a value against one limit with the rule set's decision rule (JCGM 106:2012 §8).
 * - simple acceptance: pass when within the limit (reading ≤ limit for a maximum), else fail.
 * - guarded acceptance: pass when value + U ≤ limit, fail when value − U > limit, otherwise
 *   inconclusive (re-measure, or the chief scrutineer decides). Mirrored for a minimum.
 * Differences below 1e-12 of the quantities' size count as equal (unit conversion noise).
 * @param value best estimate (mean), in the limit's unit
 * @param standardUncertainty combined standard uncertainty u_c of `value`
 */
export function decideLimit(args: {
  value: number;
  standardUncertainty: number;
  limit: number;
  side: "max" | "min";
  decisionRule: DecisionRule;
}): LimitDecision {
  const { value, standardUncertainty, limit, side, decisionRule } = args;
  const expanded = decisionRule.k * standardUncertainty;
  // 14 in typed as a limit is 355.59999999999997 mm; a reading typed as 355.6 mm must not fail it.
  const scale = NOISE * Math.max(1, Math.abs(limit), Math.abs(value), expanded);
  const raw = side === "max" ? limit - value : value - limit;
  const margin = Math.abs(raw) <= scale ? 0 : raw;
  const atLeast = (a: number, b: number) => a >= b || Math.abs(a - b) <= scale;
  const probability = conformanceProbability({ value, standardUncertainty, limit, side });
  if (decisionRule.kind === "simple") {
    return {
      outcome: margin >= 0 ? "pass" : "fail",
      marginToLimit: margin,
      expandedUncertainty: expanded,
      conformanceProbability: probability,
      acceptanceLimit: limit,
    };
  }
  const outcome = atLeast(margin, expanded)
    ? "pass"
    : !atLeast(margin, -expanded)
      ? "fail"
      : "inconclusive";
  return {
    outcome,
    marginToLimit: margin,
    expandedUncertainty: expanded,
    conformanceProbability: probability,
    acceptanceLimit: side === "max" ? limit - expanded : limit + expanded,
  };
}
