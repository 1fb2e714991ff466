import { describe, expect, it } from "vitest";
import { wingSpanFromPartsMm } from "@/lib/scrutineer/aero/wing-span-from-parts";
import type { TechRecord } from "@/lib/scrutineer/records/record-schema";
import type { RuleSetInput } from "@/lib/scrutineer/rule-sets/rule-set-schema";
import { evaluateEntry } from "@/lib/scrutineer/verdicts/evaluate-entry";
import { clubRuleSet, input, lengthReading } from "./fixtures";

const IN = 25.4; // Source: NIST SP 811 App. B.8 — 1 in = 25.4 mm exactly
const ROOF = 1300; // roof peak from the ground, mm (arbitrary test car)

/** A car read at the tech line: span, body, overhang and wing top above the roof, all in inches. */
function clubCar(a: {
  spanIn: number;
  bodyIn: number;
  behindIn: number;
  aboveRoofIn: number;
}): TechRecord[] {
  return [
    lengthReading(1, "wingSpanMm", a.spanIn * IN),
    lengthReading(2, "bodyWidthMm", a.bodyIn * IN),
    lengthReading(3, "wingOverhangMm", a.behindIn * IN),
    lengthReading(4, "wingTopFromGroundMm", ROOF + a.aboveRoofIn * IN),
    lengthReading(5, "roofPeakFromGroundMm", ROOF),
  ];
}

function judge(
  records: TechRecord[],
  ruleSet: RuleSetInput = clubRuleSet(),
  length: "mm" | "in" = "in",
) {
  return evaluateEntry(
    input({ ruleSet, records, declaredClassId: ruleSet.classes[0]?.id ?? "", length }),
  );
}

describe("the club rule: span ≤ body, ≤ 5 in behind, ≤ 8 in above the roof, else move up", () => {
  it("two 32 in halves and two 1/4 in end plates span 64.5 in", () => {
    // Source: common practice (no source) — 32 + 32 + 1/4 + 1/4 = 64.5 in, end plates counted
    expect(wingSpanFromPartsMm([32 * IN, 32 * IN], [0.25 * IN, 0.25 * IN])).toBeCloseTo(
      64.5 * IN,
      9,
    );
  });

  it("a 64.5 in wing on a 64.5 in body clears", () => {
    // Source: common practice (no source) — span no wider than the body
    const v = judge(clubCar({ spanIn: 64.5, bodyIn: 64.5, behindIn: 4, aboveRoofIn: 7 }));
    expect(v.status).toBe("cleared");
    expect(v.classId).toBe("club");
    const span = v.classChecks[0]?.rules.find((r) => r.ruleId === "wing-span");
    expect(span?.outcome).toBe("pass");
    expect(span?.reason).toBe(
      "Wing span 64.5 in, end plates counted, on a body 64.5 in wide; limit the body's width; exactly on the limit.",
    );
  });

  it("the same wing on a 64.0 in body does not: the car moves up", () => {
    // Source: common practice (no source) — a car that goes beyond moves up a class
    const v = judge(clubCar({ spanIn: 64.5, bodyIn: 64.0, behindIn: 4, aboveRoofIn: 7 }));
    expect(v.status).toBe("moved-up");
    expect(v.classId).toBe("open");
    const span = v.classChecks[0]?.rules.find((r) => r.ruleId === "wing-span");
    expect(span?.marginToLimit).toBeCloseTo(-0.5 * IN, 9);
    expect(span?.reason).toMatch(/over by 0\.5 in — moves up to Open\.$/);
    expect(v.reason).toMatch(/^Moves up from Club to Open — wing span 64\.5 in/);
  });

  it("5.25 in behind the rearmost part moves the car up; 5 in does not", () => {
    // Source: common practice (no source) — no more than 5 in behind the rearmost part of the car
    const behind = judge(clubCar({ spanIn: 64, bodyIn: 64.5, behindIn: 5.25, aboveRoofIn: 7 }));
    expect(behind.status).toBe("moved-up");
    const overhang = behind.classChecks[0]?.rules.find((r) => r.ruleId === "wing-overhang");
    expect(overhang?.reason).toBe(
      "Wing 5.25 in behind the rearmost bodywork; limit 5 in behind; over by 0.25 in — moves up to Open.",
    );
    expect(judge(clubCar({ spanIn: 64, bodyIn: 64.5, behindIn: 5, aboveRoofIn: 7 })).status).toBe(
      "cleared",
    );
  });

  it("more than 8 in above the roof moves the car up, and the reason reads aloud in mm", () => {
    // Source: common practice (no source) — no more than 8 in above the roof (8 in = 203.2 mm)
    const v = judge(
      clubCar({ spanIn: 64, bodyIn: 64.5, behindIn: 4, aboveRoofIn: 8.1 }),
      clubRuleSet(),
      "mm",
    );
    const height = v.classChecks[0]?.rules.find((r) => r.ruleId === "wing-height");
    expect(v.status).toBe("moved-up");
    expect(height?.reason).toBe(
      "Wing top 205.7 mm above the roof; limit 203.2 mm; over by 2.5 mm — moves up to Open.",
    );
    expect(judge(clubCar({ spanIn: 64, bodyIn: 64.5, behindIn: 4, aboveRoofIn: 7.9 })).status).toBe(
      "cleared",
    );
  });

  it("under guarded acceptance the wing exactly as wide as the body is too close to call", () => {
    // Source: JCGM 106:2012 §8 — value + U > limit and value − U ≤ limit is inconclusive (DOMAIN.md)
    const v = judge(
      clubCar({ spanIn: 64.5, bodyIn: 64.5, behindIn: 4, aboveRoofIn: 7 }),
      clubRuleSet({ kind: "guarded", k: 2 }),
    );
    expect(v.status).toBe("re-measure");
    expect(v.flags).toContain("inconclusive");
    expect(v.fallbackClassId).toBe("open");
    expect(v.reason).toMatch(
      /exactly on the limit; the ± 0\.11 in uncertainty leaves it undecided/,
    );
    expect(v.reason).toMatch(/if over, moves up to Open/);
  });
});

/** One class with the given aero limits, and an unlimited class above it. */
function ladder(limited: RuleSetInput["classes"][number]["aero"]): RuleSetInput {
  const base = clubRuleSet();
  return {
    ...base,
    classes: [{ id: "limited", name: "Limited", aero: limited }, ...base.classes.slice(1)],
  };
}

describe("published limits as rule-set fixtures", () => {
  // Source: Motorsport UK NCR 2026 Ch.14 App.4, p.552 — wing top ≤ 200 mm above the roof; rearmost point ≤ 200 mm behind the bodywork
  const msuk = ladder({
    wing: {
      allowed: true,
      height: { reference: "roof-peak", maxMm: 200 },
      maxOverhangMm: 200,
      span: null,
      maxChordMm: null,
    },
    splitter: { allowed: true, maxProtrusionMm: 200, width: null },
  });

  it("200 mm above the roof clears; 201 mm moves up", () => {
    const at = (aboveMm: number) =>
      judge(
        [
          lengthReading(1, "wingTopFromGroundMm", ROOF + aboveMm),
          lengthReading(2, "roofPeakFromGroundMm", ROOF),
          lengthReading(3, "wingOverhangMm", 150),
        ],
        msuk,
        "mm",
      );
    expect(at(200).status).toBe("cleared");
    const over = at(201);
    expect(over.status).toBe("moved-up");
    expect(over.classChecks[0]?.rules[0]?.reason).toBe(
      "Wing top 201 mm above the roof; limit 200 mm; over by 1 mm — moves up to Open.",
    );
  });

  it("200 mm behind the bodywork clears; 200.5 mm moves up", () => {
    const at = (behindMm: number) =>
      judge(
        [
          lengthReading(1, "wingTopFromGroundMm", ROOF + 100),
          lengthReading(2, "roofPeakFromGroundMm", ROOF),
          lengthReading(3, "wingOverhangMm", behindMm),
        ],
        msuk,
        "mm",
      );
    expect(at(200).status).toBe("cleared");
    expect(at(200.5).status).toBe("moved-up");
    expect(at(-30).classChecks[0]?.rules[1]?.reason).toBe(
      "Wing 30 mm inside the rearmost bodywork; limit 200 mm behind; 230 mm inside.",
    );
  });

  it("10 in above the roof, read in inches", () => {
    // Source: a national time-attack series' 2024 class rules 1.3 — wing ≤ 10 in (254 mm) above the roof
    const series = ladder({
      wing: {
        allowed: true,
        height: { reference: "roof-peak", maxMm: 10 * IN },
        maxOverhangMm: null,
        span: null,
        maxChordMm: null,
      },
      splitter: { allowed: true, maxProtrusionMm: null, width: null },
    });
    const v = judge(
      [
        lengthReading(1, "wingTopFromGroundMm", ROOF + 254),
        lengthReading(2, "roofPeakFromGroundMm", ROOF),
      ],
      series,
      "in",
    );
    expect(v.status).toBe("cleared");
    expect(v.classChecks[0]?.rules[0]?.reason).toBe(
      "Wing top 10 in above the roof; limit 10 in; exactly on the limit.",
    );
  });

  it("a splitter ladder of 4 in, 5 in and 200 mm moves a 110 mm splitter up one class", () => {
    // Source: a marque club's racing rules — splitter ≤ 4 in (101.6 mm); club time-trial category rules — ≤ 5 in (127 mm);
    // Motorsport UK NCR 2026 Ch.14 App.4 — ≤ 200 mm
    const noWing = {
      allowed: true,
      height: null,
      maxOverhangMm: null,
      span: null,
      maxChordMm: null,
    } as const;
    const rs: RuleSetInput = {
      ...clubRuleSet(),
      classes: [
        {
          id: "four",
          name: "Four-inch",
          aero: { wing: noWing, splitter: { allowed: true, maxProtrusionMm: 4 * IN, width: null } },
        },
        {
          id: "five",
          name: "Five-inch",
          aero: { wing: noWing, splitter: { allowed: true, maxProtrusionMm: 5 * IN, width: null } },
        },
        {
          id: "metric",
          name: "Metric",
          aero: { wing: noWing, splitter: { allowed: true, maxProtrusionMm: 200, width: null } },
        },
      ],
    };
    const v = judge([lengthReading(1, "splitterProtrusionMm", 110)], rs, "mm");
    expect(v.status).toBe("moved-up");
    expect(v.classId).toBe("five");
    expect(v.classChecks[0]?.rules[0]?.reason).toBe(
      "Splitter 110 mm ahead of the bumper; limit 101.6 mm; over by 8.4 mm — moves up to Five-inch.",
    );
    expect(judge([lengthReading(1, "splitterProtrusionMm", 210)], rs, "mm").status).toBe("held");
  });

  it("a 14 in chord limit", () => {
    // Source: club time-trial category rules — wing chord ≤ 14 in (355.6 mm)
    const rs = ladder({
      wing: { allowed: true, height: null, maxOverhangMm: null, span: null, maxChordMm: 14 * IN },
      splitter: { allowed: true, maxProtrusionMm: null, width: null },
    });
    expect(judge([lengthReading(1, "wingChordMm", 355.6)], rs).status).toBe("cleared");
    expect(judge([lengthReading(1, "wingChordMm", 356)], rs).status).toBe("moved-up");
  });

  it("a wing in a class that allows none moves the car up", () => {
    // Source: common practice (no source) — classes without a wing; a car beyond the class moves up
    const rs = ladder({ wing: { allowed: false }, splitter: { allowed: false } });
    const v = judge([lengthReading(1, "wingChordMm", 250)], rs);
    expect(v.status).toBe("moved-up");
    expect(v.classChecks[0]?.rules[0]?.reason).toBe(
      "Wing fitted; Limited allows none — moves up to Open.",
    );
  });
});
