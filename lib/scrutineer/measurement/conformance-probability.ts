import { normalCdf } from "./normal-cdf";

/**
 * Probability that the true value conforms to a single limit, given the best estimate and its
 * standard uncertainty under a normal model (JCGM 106:2012 §7): for an upper limit T_U,
 * p_c = Φ((T_U − y)/u); for a lower limit T_L, p_c = Φ((y − T_L)/u).
 * With u = 0 the answer is 1 or 0.
 */
export function conformanceProbability(args: {
  value: number;
  standardUncertainty: number;
  limit: number;
  side: "max" | "min";
}): number {
  const margin = args.side === "max" ? args.limit - args.value : args.value - args.limit;
  if (args.standardUncertainty === 0) return margin >= 0 ? 1 : 0;
  return normalCdf(margin / args.standardUncertainty);
}
