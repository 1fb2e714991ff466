import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { fitCarToClasses } from "@/lib/scrutineer/aero/fit-car-to-classes";
import { precheckWingPlan } from "@/lib/scrutineer/aero/precheck-wing-plan";
import { plannedSpanMm } from "@/lib/scrutineer/aero/wing-plan-dimensions";
import {
  type PlanLengthUnit,
  planLengthMm,
  type WingPlan,
  wingPlanSchema,
} from "@/lib/scrutineer/aero/wing-plan-schema";
import { ruleSetSchema } from "@/lib/scrutineer/rule-sets/rule-set-schema";
import { clubRuleSet } from "../scrutineer/fixtures";

// The club fixture: span ≤ body width (end plates counted), wing top ≤ 8 in above the roof,
// ≤ 5 in behind the rearmost bodywork; then an open class with no wing limits.
// Source: common practice (no source) — span no wider than the body, end plates counted
const ruleSet = ruleSetSchema.parse(clubRuleSet({ kind: "guarded", k: 2 }));

const inch = (value: number) => ({ value, unit: "in" as const });
const mm = (value: number) => ({ value, unit: "mm" as const });

/** The issue's wing: two 32 in halves and two ¼ in end plates, on a body `bodyIn` wide. */
function issuePlan(bodyIn: number): WingPlan {
  return wingPlanSchema.parse({
    car: { bodyWidth: inch(bodyIn), roofHeight: inch(52), rearmostBodywork: inch(36) },
    wing: {
      span: { kind: "parts", half: inch(32) },
      endPlate: inch(0.25),
      chord: inch(10),
      height: inch(58), // 6 in above the roof
      mount: { distance: inch(3), direction: "behind" },
    },
  });
}

const club = (plan: WingPlan) => {
  const fit = precheckWingPlan({ plan, ruleSet }).find((f) => f.classId === "club");
  if (!fit) throw new Error("no club class");
  return fit;
};
const spanOf = (plan: WingPlan) => club(plan).limits.find((l) => l.ruleId === "wing-span");

describe("the aero pre-check", () => {
  it("counts two 32 in halves and two ¼ in end plates as a 64.5 in span", () => {
    // Source: common practice (no source) — 32 + 32 + ¼ + ¼ = 64.5 in, end plates counted
    // Source: NIST SP 811 App. B.8 — 1 in = 25.4 mm exactly, so 64.5 in = 1638.3 mm
    expect(plannedSpanMm(issuePlan(64.5))).toBeCloseTo(1638.3, 9);
    expect(spanOf(issuePlan(64.5))?.planned).toBeCloseTo(64.5, 9);
  });

  it("fits a 64.5 in body exactly (margin 0) under a span-to-body-width class", () => {
    // Source: common practice (no source) — a span equal to the body width is within the limit
    const span = spanOf(issuePlan(64.5));
    expect(span?.fits).toBe(true);
    expect(span?.margin).toBe(0);
    expect(span?.limit).toBeCloseTo(64.5, 9);
    expect(span?.unit).toBe("in");
    expect(span?.words).toBe(
      "Wing span 64.5 in, end plates counted, on a body 64.5 in wide; limit the body's width; exactly on the limit",
    );
    expect(club(issuePlan(64.5)).fits).toBe(true);
  });

  it("is 0.5 in over on a 64.0 in body, and says so in inches", () => {
    // Source: common practice (no source) — 64.5 in − 64.0 in = 0.5 in over the body width
    const fit = club(issuePlan(64));
    const span = fit.limits.find((l) => l.ruleId === "wing-span");
    expect(fit.fits).toBe(false);
    expect(span?.fits).toBe(false);
    expect(span?.margin).toBeCloseTo(-0.5, 9);
    expect(span?.words).toBe(
      "Wing span 64.5 in, end plates counted, on a body 64 in wide; limit the body's width; over by 0.5 in",
    );
    expect(fit.words).toContain("Over in Club");
    // Height and overhang are inside their limits: only the span is over.
    expect(fit.limits.filter((l) => !l.fits).map((l) => l.ruleId)).toEqual(["wing-span"]);
  });

  it("gives every class of the ladder in order, and says when a class sets no wing limits", () => {
    const fits = precheckWingPlan({ plan: issuePlan(64), ruleSet });
    expect(fits.map((f) => f.classId)).toEqual(["club", "open"]);
    expect(fits[1]?.fits).toBe(true);
    expect(fits[1]?.limits).toEqual([]);
    expect(fits[1]?.words).toBe("Open sets no wing limits: this wing fits.");
  });

  it("says a class that allows no wing is refused", () => {
    const noWing = ruleSetSchema.parse({
      ...clubRuleSet(),
      classes: [
        {
          id: "street",
          name: "Street",
          aero: { wing: { allowed: false }, splitter: { allowed: false } },
        },
        ...clubRuleSet().classes,
      ],
    });
    const [street] = precheckWingPlan({ plan: issuePlan(64.5), ruleSet: noWing });
    expect(street?.fits).toBe(false);
    expect(street?.words).toBe("Street allows no wing.");
    expect(street?.limits[0]?.words).toBe("A wing is planned; Street allows none");
  });

  it("gives each limit in the unit of its own field", () => {
    // Source: NIST SP 811 App. B.8 — 1 in = 25.4 mm exactly: a 5 in limit is 127 mm,
    // 8 in is 203.2 mm
    const plan = issuePlan(64.5);
    const mixed = wingPlanSchema.parse({
      ...plan,
      wing: {
        ...plan.wing,
        height: mm(58 * 25.4), // 6 in above a 52 in roof, typed in mm
        mount: { distance: mm(100), direction: "behind" },
      },
    });
    const limits = club(mixed).limits;
    const overhang = limits.find((l) => l.ruleId === "wing-overhang");
    const height = limits.find((l) => l.ruleId === "wing-height");
    expect(overhang?.unit).toBe("mm");
    expect(overhang?.limit).toBeCloseTo(127, 9);
    expect(overhang?.margin).toBeCloseTo(27, 9);
    expect(overhang?.words).toBe(
      "Wing 100 mm behind the rearmost bodywork; limit 127 mm behind; 27 mm inside",
    );
    expect(height?.unit).toBe("mm");
    expect(height?.planned).toBeCloseTo(152.4, 9);
    expect(height?.limit).toBeCloseTo(203.2, 9);
    // The span stays in inches, as its parts were typed.
    expect(limits.find((l) => l.ruleId === "wing-span")?.unit).toBe("in");
  });

  it("treats a mount ahead of the bodywork as a negative overhang", () => {
    const plan = issuePlan(64.5);
    const ahead = {
      ...plan,
      wing: { ...plan.wing, mount: { distance: inch(2), direction: "ahead" as const } },
    };
    const overhang = club(ahead).limits.find((l) => l.ruleId === "wing-overhang");
    expect(overhang?.planned).toBeCloseTo(-2, 9);
    expect(overhang?.margin).toBeCloseTo(7, 9);
  });

  it("refuses lengths that cannot be a plan", () => {
    const plan = issuePlan(64.5);
    const bad = (patch: object) => wingPlanSchema.safeParse({ ...plan, ...patch }).success;
    expect(bad({ car: { ...plan.car, bodyWidth: inch(-1) } })).toBe(false);
    expect(bad({ car: { ...plan.car, bodyWidth: inch(0) } })).toBe(false);
    expect(bad({ car: { ...plan.car, bodyWidth: { value: 64, unit: "cubits" } } })).toBe(false);
    // Source: NIST SP 811 App. B.8 — 400 in = 10 160 mm, longer than the 10 m cap
    expect(bad({ car: { ...plan.car, bodyWidth: inch(400) } })).toBe(false);
    expect(bad({ car: { ...plan.car, bodyWidth: mm(10_000) } })).toBe(true);
  });
});

describe("plan lengths convert with the international inch", () => {
  it("uses 25.4 mm per inch exactly", () => {
    // Source: NIST SP 811 App. B.8 — 1 in = 25.4 mm exactly
    expect(planLengthMm(inch(1))).toBe(25.4);
    expect(planLengthMm(inch(0.25))).toBe(6.35);
    expect(planLengthMm(mm(6.35))).toBe(6.35);
    // Source: DOMAIN.md Units [S: NIST SP 811 App. B.8] — 200 mm = 7.874015748 in
    const plan = issuePlan(64.5);
    const at200 = {
      ...plan,
      wing: { ...plan.wing, mount: { distance: mm(200), direction: "behind" as const } },
    };
    const overhang = club(at200).limits.find((l) => l.ruleId === "wing-overhang");
    expect(overhang?.unit).toBe("mm");
    expect(overhang?.planned).toBe(200);
    const inInches = {
      ...at200,
      wing: { ...at200.wing, mount: { distance: inch(7.874015748), direction: "behind" as const } },
    };
    expect(club(inInches).limits.find((l) => l.ruleId === "wing-overhang")?.planned).toBeCloseTo(
      7.874015748,
      9,
    );
  });
});

describe("fitting a garage car to the classes", () => {
  it("uses the car's own body width over the plan's", () => {
    // Source: NIST SP 811 App. B.8 — 64.0 in = 1625.6 mm; common practice (no source) — span ≤ body
    const fits = fitCarToClasses({
      car: { bodyWidthMm: 1625.6, roofHeightMm: 52 * 25.4 },
      plan: issuePlan(64.5),
      ruleSet,
    });
    expect(fits.club?.fits).toBe(false);
    expect(fits.club?.words).toContain("over by 0.5 in");
    expect(fits.open?.fits).toBe(true);
  });

  it("says the wing has not been planned when there is no plan", () => {
    const fits = fitCarToClasses({
      car: { bodyWidthMm: 1625.6, roofHeightMm: 1300 },
      plan: null,
      ruleSet,
    });
    expect(Object.keys(fits)).toEqual(["club", "open"]);
    expect(fits.club).toEqual({
      fits: false,
      words: "The wing has not been planned yet: the pre-check says which classes it fits.",
    });
  });

  it("falls back to the plan's figures where the garage has none, and says so", () => {
    const fits = fitCarToClasses({
      car: { bodyWidthMm: null, roofHeightMm: null },
      plan: issuePlan(64.5),
      ruleSet,
    });
    expect(fits.club?.fits).toBe(true);
    expect(fits.club?.words).toContain("the plan's body width and roof height");
  });
});

// Properties over random plans in either unit.
const unit = fc.constantFrom<PlanLengthUnit>("mm", "in");
const lengthIn = (minMm: number, maxMm: number) =>
  fc
    .tuple(fc.double({ min: minMm, max: maxMm, noNaN: true }), unit)
    .map(([v, u]) => ({ value: u === "mm" ? v : v / 25.4, unit: u }));
const planArb: fc.Arbitrary<WingPlan> = fc
  .record({
    body: lengthIn(1400, 2100),
    roof: lengthIn(1100, 1500),
    rear: lengthIn(500, 1200),
    whole: fc.boolean(),
    span: lengthIn(1000, 2300),
    plate: lengthIn(0, 20),
    chord: lengthIn(100, 450),
    height: lengthIn(1000, 1900),
    mount: lengthIn(0, 300),
    behind: fc.boolean(),
  })
  .map((r) =>
    wingPlanSchema.parse({
      car: { bodyWidth: r.body, roofHeight: r.roof, rearmostBodywork: r.rear },
      wing: {
        span: r.whole
          ? { kind: "whole", span: r.span }
          : { kind: "parts", half: { value: r.span.value / 2, unit: r.span.unit } },
        endPlate: r.plate,
        chord: r.chord,
        height: r.height,
        mount: { distance: r.mount, direction: r.behind ? "behind" : "ahead" },
      },
    }),
  );

describe("pre-check properties", () => {
  it("a plan that meets every limit of a class fits it, and one that misses any does not", () => {
    fc.assert(
      fc.property(planArb, (plan) => {
        for (const fit of precheckWingPlan({ plan, ruleSet })) {
          const allMet = fit.limits.every((l) => l.margin !== null && l.margin >= 0);
          expect(fit.fits).toBe(allMet);
          for (const l of fit.limits) expect(l.fits).toBe((l.margin ?? -1) >= 0);
        }
      }),
      { numRuns: 300 },
    );
  });

  it("growing the span never turns a failing span check into a pass", () => {
    fc.assert(
      fc.property(planArb, fc.double({ min: 0, max: 500, noNaN: true }), (plan, growMm) => {
        const before = spanOf(plan);
        const grown: WingPlan = {
          ...plan,
          wing: {
            ...plan.wing,
            span: { kind: "whole", span: { value: plannedSpanMm(plan) + growMm, unit: "mm" } },
          },
        };
        const after = spanOf(grown);
        if (before && !before.fits) expect(after?.fits).toBe(false);
      }),
      { numRuns: 300 },
    );
  });
});
