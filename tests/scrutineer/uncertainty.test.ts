import fc from "fast-check";
import jstat from "jstat";
import { describe, expect, it } from "vitest";
import { combineReadings } from "@/lib/scrutineer/measurement/combine-readings";
import { conformanceProbability } from "@/lib/scrutineer/measurement/conformance-probability";
import { decideLimit } from "@/lib/scrutineer/measurement/decide-limit";
import { describeMargin } from "@/lib/scrutineer/measurement/describe-margin";
import { findDisagreements } from "@/lib/scrutineer/measurement/find-disagreements";
import { normalCdf } from "@/lib/scrutineer/measurement/normal-cdf";
import { spread } from "./fixtures";

const tape = (value: number, u = 0.5, instrumentId = "tape") => ({
  value,
  standardUncertainty: u,
  instrumentId,
});

describe("combineReadings (GUM, JCGM 100:2008)", () => {
  it("gives the mean and Type A s/√n that a statistics package gives", () => {
    fc.assert(
      fc.property(fc.array(spread(100, 2000), { minLength: 2, maxLength: 12 }), (values) => {
        const c = combineReadings(
          values.map((v) => tape(v)),
          2,
        );
        if (c === null) return false;
        // Source: JCGM 100:2008 §4.2.1 (mean), §4.2.2 (s with n − 1), §4.2.3 (u_A = s/√n); checked against jstat
        const s = jstat.stdev(values, true);
        expect(c.mean).toBeCloseTo(jstat.mean(values), 9);
        expect(c.experimentalStandardDeviation ?? Number.NaN).toBeCloseTo(s, 9);
        expect(c.typeAStandardUncertainty).toBeCloseTo(s / Math.sqrt(values.length), 9);
        return true;
      }),
    );
  });

  it("combines Type A and Type B in quadrature and expands with k", () => {
    // Worked here: readings 200, 202, 204 mm → mean 202, s = 2, u_A = 2/√3 = 1.1547;
    // one tape with u_B = 0.5 → u_c = √(1.1547² + 0.5²) = √(1.3333 + 0.25) = 1.2583; U = 2 × 1.2583 = 2.5166.
    // Source: JCGM 100:2008 §5.1.2 (combination), §6.2.1 (U = k·u_c)
    const c = combineReadings([tape(200), tape(202), tape(204)], 2);
    expect(c?.mean).toBe(202);
    expect(c?.typeAStandardUncertainty).toBeCloseTo(1.1547005, 6);
    expect(c?.typeBStandardUncertainty).toBe(0.5);
    expect(c?.combinedStandardUncertainty).toBeCloseTo(1.2583057, 6);
    expect(c?.expandedUncertainty).toBeCloseTo(2.5166115, 6);
  });

  it("has no Type A for a single reading, so u is the instrument's", () => {
    const c = combineReadings([tape(150, 1.5)], 2);
    expect(c?.typeAStandardUncertainty).toBe(0);
    expect(c?.combinedStandardUncertainty).toBe(1.5); // Source: JCGM 100:2008 §4.3 — Type B from the stated uncertainty
  });

  it("keeps one instrument's Type B whole but averages independent instruments", () => {
    // Worked here: two readings on one tape (u 1) → u_B = 1 (same tape, fully correlated);
    // one reading each on two tapes (u 1) → u_B = √((½·1)² + (½·1)²) = 0.7071.
    // Source: JCGM 100:2008 §5.2 (correlated inputs) and §5.1.2 (uncorrelated)
    expect(
      combineReadings([tape(100, 1, "a"), tape(100, 1, "a")], 2)?.typeBStandardUncertainty,
    ).toBe(1);
    expect(
      combineReadings([tape(100, 1, "a"), tape(100, 1, "b")], 2)?.typeBStandardUncertainty,
    ).toBeCloseTo(Math.SQRT1_2, 12);
  });

  it("does not depend on the order of the readings", () => {
    fc.assert(
      fc.property(fc.array(spread(0, 3000), { minLength: 1, maxLength: 8 }), (values) => {
        const a = combineReadings(
          values.map((v) => tape(v)),
          2,
        );
        const b = combineReadings(
          [...values].reverse().map((v) => tape(v)),
          2,
        );
        expect(a).toEqual(b);
      }),
    );
  });
});

describe("findDisagreements", () => {
  const r = (
    recordId: string,
    officialId: string,
    value: number,
    u = 1,
    instrumentId = "tape",
  ) => ({
    recordId,
    officialId,
    value,
    standardUncertainty: u,
    instrumentId,
  });

  it("flags two officials' readings further apart than k·√(u₁² + u₂²)", () => {
    // Worked here: u 1 mm each, k 2 → allowed 2√2 = 2.83 mm. 3 mm apart disagrees; 2.8 mm does not.
    // Source: JCGM 100:2008 §5.1.2 (u of a difference) with U = k·u (§6.2.1)
    const found = findDisagreements([r("b", "sam", 203), r("a", "dev", 200)], 2);
    expect(found).toHaveLength(1);
    expect(found[0]?.first).toMatchObject({ officialId: "dev", mean: 200, recordIds: ["a"] });
    expect(found[0]?.second).toMatchObject({ officialId: "sam", mean: 203, recordIds: ["b"] });
    expect(found[0]?.allowedDifference).toBeCloseTo(2 * Math.SQRT2, 12);
    expect(findDisagreements([r("a", "dev", 200), r("b", "sam", 202.8)], 2)).toEqual([]);
  });

  it("one official's repeated readings are a Type A sample, not a disagreement", () => {
    // Source: ARCHITECTURE.md — disagreement is between two scrutineers' readings of one car;
    // JCGM 100:2008 §4.2 — repeated observations are evaluated as Type A (s/√n), not compared pairwise.
    // 1400, 1402, 1401 mm on a u = 0.5 mm gauge: 1400 and 1402 are 2 mm apart, more than
    // 2·√(0.5² + 0.5²) = 1.41 mm, yet they are one official's sample.
    const same = [
      r("a", "dev", 1400, 0.5, "g"),
      r("b", "dev", 1402, 0.5, "g"),
      r("c", "dev", 1401, 0.5, "g"),
    ];
    expect(findDisagreements(same, 2)).toEqual([]);
  });

  it("compares officials by their combined values, each with its own Type A and Type B", () => {
    // Source: JCGM 100:2008 §4.2.3 (u_A = s/√n), §5.1.2 (u_c), §6.2.1 (U = k·u).
    // Worked here: Dev 1400, 1402, 1401 mm (u_B 0.5): mean 1401, s 1, u_A 1/√3 = 0.57735,
    // u_c √(1/3 + 0.25) = 0.76376. Sam 1404 mm once (u_B 0.5, u_A 0): u_c 0.5.
    // Allowed 2·√(0.76376² + 0.5²) = 2·√(0.58333 + 0.25) = 1.82574 mm; 3 mm apart → disagree.
    const found = findDisagreements(
      [
        r("a", "dev", 1400, 0.5, "g"),
        r("b", "dev", 1402, 0.5, "g"),
        r("c", "dev", 1401, 0.5, "g"),
        r("d", "sam", 1404, 0.5, "g2"),
      ],
      2,
    );
    expect(found).toHaveLength(1);
    expect(found[0]?.first).toMatchObject({ officialId: "dev", n: 3, recordIds: ["a", "b", "c"] });
    expect(found[0]?.first.mean).toBeCloseTo(1401, 12);
    expect(found[0]?.first.combinedStandardUncertainty).toBeCloseTo(Math.sqrt(1 / 3 + 0.25), 12);
    expect(found[0]?.difference).toBeCloseTo(3, 12);
    expect(found[0]?.allowedDifference).toBeCloseTo(2 * Math.sqrt(1 / 3 + 0.25 + 0.25), 12);
    // Sam at 1402.5 mm: 1.5 mm apart, inside the 1.83 mm allowed.
    expect(
      findDisagreements(
        [
          r("a", "dev", 1400, 0.5, "g"),
          r("b", "dev", 1402, 0.5, "g"),
          r("c", "dev", 1401, 0.5, "g"),
          r("d", "sam", 1402.5, 0.5, "g2"),
        ],
        2,
      ),
    ).toEqual([]);
  });
});

describe("describeMargin", () => {
  it("words a guarded-acceptance doubt as one line a scrutineer can read aloud", () => {
    // Source: JCGM 106:2012 §8 — inside the guard band the result is undecided (DOMAIN.md)
    const doubt = (marginToLimit: number, unit: "mm" | "lb/hp", expandedUncertainty: number) =>
      describeMargin({
        outcome: "inconclusive",
        marginToLimit,
        side: unit === "mm" ? "max" : "min",
        unit,
        display: { length: "mm", mass: "kg" },
        expandedUncertainty,
      });
    expect(doubt(0, "mm", 2.83)).toBe(
      "exactly on the limit; the ± 2.8 mm uncertainty leaves it undecided",
    );
    expect(doubt(0.004, "lb/hp", 0.019)).toBe(
      "less than 0.01 lb/hp inside; the ± 0.02 lb/hp uncertainty leaves it undecided",
    );
  });
});

describe("normal model, checked against jstat", () => {
  it("Φ matches jstat's normal CDF across the range", () => {
    for (let z = -8; z <= 8; z += 0.01) {
      expect(Math.abs(normalCdf(z) - jstat.normal.cdf(z, 0, 1))).toBeLessThan(1e-12); // Source: jstat 1.9.6 normal.cdf
    }
  });

  it("conformance probability for an upper limit is Φ((T_U − y)/u)", () => {
    fc.assert(
      fc.property(spread(0, 500), spread(0.01, 20), spread(0, 500), (value, u, limit) => {
        // Source: JCGM 106:2012 §7 — p_c = Pr(Y ≤ T_U) for Y ~ N(y, u²) (sub-clause from memory); checked against jstat
        const expected = jstat.normal.cdf(limit, value, u);
        expect(
          conformanceProbability({ value, standardUncertainty: u, limit, side: "max" }),
        ).toBeCloseTo(expected, 10);
        // Source: JCGM 106:2012 §7 — lower limit: p_c = Pr(Y ≥ T_L) (sub-clause from memory)
        expect(
          conformanceProbability({ value, standardUncertainty: u, limit, side: "min" }),
        ).toBeCloseTo(1 - expected, 10);
      }),
    );
  });
});

describe("guarded acceptance zones (JCGM 106:2012 §8)", () => {
  const guarded = { kind: "guarded", k: 2 } as const;

  it("clears, refuses or doubts exactly where the conformance probability crosses Φ(±k)", () => {
    fc.assert(
      fc.property(
        spread(0, 400),
        spread(0.05, 10),
        spread(-5, 5), // where the limit sits, in standard uncertainties
        fc.constantFrom(1, 1.645, 2, 3),
        (value, u, zLimit, k) => {
          const limit = value + zLimit * u;
          const z = (limit - value) / u;
          fc.pre(Math.abs(z - k) > 1e-6 && Math.abs(z + k) > 1e-6); // keep clear of the boundaries
          const d = decideLimit({
            value,
            standardUncertainty: u,
            limit,
            side: "max",
            decisionRule: { kind: "guarded", k },
          });
          const p = jstat.normal.cdf(limit, value, u);
          // Source: JCGM 106:2012 §8 — guarded acceptance: accept when y + U ≤ T_U, over when y − U > T_U,
          // U = k·u (DOMAIN.md); in probability terms p_c ≥ Φ(k) accepts and p_c < Φ(−k) rejects (checked with jstat)
          const expected =
            p > jstat.normal.cdf(k, 0, 1)
              ? "pass"
              : p < jstat.normal.cdf(-k, 0, 1)
                ? "fail"
                : "inconclusive";
          expect(d.outcome).toBe(expected);
          expect(d.conformanceProbability).toBeCloseTo(p, 10);
        },
      ),
      { numRuns: 500 },
    );
  });

  it("mirrors the zones for a lower limit (power-to-weight minimum)", () => {
    fc.assert(
      fc.property(spread(1, 30), spread(0.01, 1), spread(-5, 5), (value, u, zLimit) => {
        const limit = value - zLimit * u;
        fc.pre(Math.abs(Math.abs(zLimit) - 2) > 1e-6);
        const d = decideLimit({
          value,
          standardUncertainty: u,
          limit,
          side: "min",
          decisionRule: guarded,
        });
        const p = 1 - jstat.normal.cdf(limit, value, u); // Source: JCGM 106:2012 §7 — Pr(Y ≥ T_L) (sub-clause from memory)
        const expected =
          p > jstat.normal.cdf(2, 0, 1)
            ? "pass"
            : p < jstat.normal.cdf(-2, 0, 1)
              ? "fail"
              : "inconclusive";
        expect(d.outcome).toBe(expected);
      }),
      { numRuns: 300 },
    );
  });

  it("treats unit-conversion noise as equality, not as over the limit", () => {
    // Source: NIST SP 811 App. B.8 — 14 in = 355.6 mm exactly, though 14 × 25.4 is 355.59999999999997 in binary
    const d = decideLimit({
      value: 355.6,
      standardUncertainty: 0.5,
      limit: 14 * 25.4,
      side: "max",
      decisionRule: { kind: "simple", k: 2 },
    });
    expect(d.outcome).toBe("pass");
    expect(d.marginToLimit).toBe(0);
  });

  it("places the acceptance limit at T_U − U", () => {
    // Source: JCGM 106:2012 §8 — guard band w = U = k·u (DOMAIN.md)
    const d = decideLimit({
      value: 190,
      standardUncertainty: 1.5,
      limit: 200,
      side: "max",
      decisionRule: guarded,
    });
    expect(d.acceptanceLimit).toBe(197);
    expect(d.expandedUncertainty).toBe(3);
  });

  it("simple acceptance never doubts: reading ≤ limit clears", () => {
    fc.assert(
      fc.property(spread(0, 400), spread(0, 400), (value, limit) => {
        fc.pre(Math.abs(value - limit) > 1e-9); // differences of 1e-12 relative are unit-conversion noise
        // Source: JCGM 106:2012 §8 — simple acceptance: the acceptance limit is the tolerance limit (DOMAIN.md)
        const d = decideLimit({
          value,
          standardUncertainty: 2,
          limit,
          side: "max",
          decisionRule: { kind: "simple", k: 2 },
        });
        expect(d.outcome).toBe(value <= limit ? "pass" : "fail");
      }),
    );
  });
});
