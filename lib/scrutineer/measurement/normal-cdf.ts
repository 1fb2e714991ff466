const MAX_TERMS = 200;

/** erfc(x) for x ≥ 0, to about 1e-15 absolute. */
function erfcNonNegative(x: number): number {
  if (x < 3) {
    // erf(x) = 2/√π · e^(−x²) · Σ 2ⁿ x^(2n+1) / (1·3·…·(2n+1)): all terms positive, no cancellation.
    let term = x;
    let sum = x;
    for (let n = 1; n < MAX_TERMS; n += 1) {
      term *= (2 * x * x) / (2 * n + 1);
      sum += term;
      if (term < sum * 1e-17) break;
    }
    return 1 - (2 / Math.sqrt(Math.PI)) * Math.exp(-x * x) * sum;
  }
  if (x > 27) return 0;
  // Continued fraction erfc(x) = e^(−x²)/√π · 1/(x + ½/(x + 1/(x + (3/2)/(x + …)))),
  // evaluated from the bottom up; at x ≥ 3 sixty levels are far more than enough.
  let f = x;
  for (let n = 60; n >= 1; n -= 1) f = x + n / 2 / f;
  return Math.exp(-x * x) / (Math.sqrt(Math.PI) * f);
}

/**
 * The standard normal cumulative distribution function Φ(z) = P(Z ≤ z), Z ~ N(0, 1).
 */
export function normalCdf(z: number): number {
  if (Number.isNaN(z)) return Number.NaN;
  const x = -z / Math.SQRT2;
  return x >= 0 ? 0.5 * erfcNonNegative(x) : 1 - 0.5 * erfcNonNegative(-x);
}
