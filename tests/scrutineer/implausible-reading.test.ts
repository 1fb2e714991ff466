import { describe, expect, it } from "vitest";
import { demoRuleSet } from "@/db/seed/demo-rule-set";
import { implausibleReading } from "@/lib/scrutineer/measurement/implausible-reading";
import { readingContext } from "@/lib/scrutineer/measurement/reading-context";
import type { ReadingPayload } from "@/lib/scrutineer/records/record-schema";
import { type RuleSetInput, ruleSetSchema } from "@/lib/scrutineer/rule-sets/rule-set-schema";
import { evaluateEntry } from "@/lib/scrutineer/verdicts/evaluate-entry";
import { chiefAttention } from "@/lib/tech/chief-attention";
import { needsChiefScrutineer } from "@/lib/tech/needs-chief-scrutineer";
import { clubRuleSet, input, lengthReading, TAPE } from "./fixtures";

// Issue 8, item 12: readings that cannot be true are caught before they are saved, and marked
// for the chief scrutineer when saved anyway.

const IN = 25.4; // Source: NIST SP 811 App. B.8 — 1 in = 25.4 mm exactly

/** A rule set with plausible ranges (test values, wide on purpose; common practice, no source). */
const withRanges = (): RuleSetInput => {
  const base = clubRuleSet();
  return {
    ...base,
    measurement: {
      ...base.measurement,
      plausible: {
        wingTopFromGroundMm: { min: 700, max: 2000 },
        wingOverhangMm: { min: -1500, max: 700 },
      },
    },
  };
};
const ruleSet = ruleSetSchema.parse(withRanges());
const length = (dimension: ReadingPayload["dimension"], value: number): ReadingPayload =>
  ({ dimension, value, instrument: TAPE }) as ReadingPayload;
const check = (reading: ReadingPayload, context = {}, unitSystem: "mm" | "in" = "mm") =>
  implausibleReading({ reading, ruleSet, context, unitSystem });

describe("implausibleReading: why a reading cannot be true, in words", () => {
  it("names a wing top far above any car, the range, and what to do", () => {
    expect(check(length("wingTopFromGroundMm", 99_999))).toBe(
      "Wing top 99,999 mm above the ground is more than any car at the tech line measures (plausible 700–2,000 mm); check the number and the unit",
    );
    expect(check(length("wingTopFromGroundMm", 1500))).toBeNull();
  });

  it("catches 64½ in typed as an overhang, in the event's unit", () => {
    // 64.5 in = 1638.3 mm: a car's width, not a wing's overhang (range 700 mm at most).
    expect(check(length("wingOverhangMm", 64.5 * IN), {}, "in")).toBe(
      "Wing overhang 64.5 in is more than any car at the tech line measures (plausible -59.06 to 27.56 in); check the number and the unit",
    );
    expect(check(length("wingOverhangMm", 5 * IN), {}, "in")).toBeNull();
  });

  it("checks a reading against the car's own other readings", () => {
    const context = readingContext([
      { payload: length("roofPeakFromGroundMm", 1300) },
      { payload: length("wingSpanMm", 1500) },
      { payload: length("bodyWidthMm", 1700) },
    ]);
    // A wing top of 600 mm on a car 1300 mm tall (typed a digit short of 1,600 mm?).
    expect(check(length("wingTopFromGroundMm", 1000), context)).toBeNull();
    expect(check(length("wingTopFromGroundMm", 600), {})).toMatch(/less than any car/);
    const noRange = ruleSetSchema.parse(clubRuleSet());
    expect(
      implausibleReading({
        reading: length("wingTopFromGroundMm", 600),
        ruleSet: noRange,
        context,
        unitSystem: "mm",
      }),
    ).toBe(
      "Wing top 600 mm above the ground is lower than half the roof peak's height (1,300 mm), below where any wing stands; check the number and the unit",
    );
    expect(check(length("endPlateThicknessMm", 800), context)).toMatch(
      /^End plate 800 mm thick makes two end plates wider than the wing span \(1,500 mm\)/,
    );
    expect(check(length("wingChordMm", 1600), context)).toMatch(/longer than the wing span/);
    expect(check(length("wingSpanMm", 3000), context)).toMatch(
      /more than half as wide again as the body \(1,700 mm\)/,
    );
    expect(check(length("wingSpanMm", 1800), context)).toBeNull();
  });

  it("has no opinion where the rule set gives no range and the car gives no context", () => {
    const noRange = ruleSetSchema.parse(clubRuleSet());
    expect(
      implausibleReading({
        reading: length("wingTopFromGroundMm", 99_999),
        ruleSet: noRange,
        context: {},
        unitSystem: "mm",
      }),
    ).toBeNull();
  });

  it("keeps older rule sets valid (the ranges are optional) and refuses a range upside down", () => {
    expect(ruleSetSchema.safeParse(clubRuleSet()).success).toBe(true);
    const upsideDown = withRanges();
    const bad = ruleSetSchema.safeParse({
      ...upsideDown,
      measurement: {
        ...upsideDown.measurement,
        plausible: { wingSpanMm: { min: 2000, max: 500 } },
      },
    });
    expect(bad.success).toBe(false);
  });

  it("the demo rule set gives every dimension a range", () => {
    expect(Object.keys(demoRuleSet.measurement.plausible ?? {}).sort()).toEqual(
      [
        "bodyWidthMm",
        "cornerWeightKg",
        "endPlateThicknessMm",
        "noiseDbA",
        "roofPeakFromGroundMm",
        "splitterProtrusionMm",
        "splitterWidthMm",
        "wingChordMm",
        "wingOverhangMm",
        "wingSpanMm",
        "wingTopFromGroundMm",
      ].sort(),
    );
  });
});

describe("evaluateEntry keeps an implausible reading and marks it for the chief scrutineer", () => {
  it("flags the verdict, says why, and puts the car in the chief's queue", () => {
    const v = evaluateEntry(
      input({
        ruleSet: withRanges(),
        records: [
          lengthReading(1, "wingTopFromGroundMm", 99_999),
          lengthReading(2, "roofPeakFromGroundMm", 1300),
        ],
        declaredClassId: "club",
      }),
    );
    expect(v.flags).toContain("implausible-reading");
    expect(v.implausibleReadings).toEqual([
      {
        recordId: lengthReading(1, "wingTopFromGroundMm", 0).id,
        dimension: "wingTopFromGroundMm",
        corner: null,
        why: "Wing top 99,999 mm above the ground is more than any car at the tech line measures (plausible 700–2,000 mm); check the number and the unit",
      },
    ]);
    // Kept as saved: the reading still counts in the dimensions.
    expect(v.dimensions.find((d) => d.dimension === "wingTopFromGroundMm")?.mean).toBe(99_999);
    expect(needsChiefScrutineer(v)).toBe(true);
    expect(
      chiefAttention({
        status: v.status,
        flags: v.flags,
        rejectedOverride: null,
        implausibleReadings: v.implausibleReadings.map((r) => r.why),
      }),
    ).toContain(
      "Check this reading: Wing top 99,999 mm above the ground is more than any car at the tech line measures (plausible 700–2,000 mm); check the number and the unit. Void it or have the car re-measured.",
    );
  });

  it("a plausible car carries no such flag", () => {
    const v = evaluateEntry(
      input({
        ruleSet: withRanges(),
        records: [
          lengthReading(1, "wingTopFromGroundMm", 1500),
          lengthReading(2, "roofPeakFromGroundMm", 1300),
        ],
        declaredClassId: "club",
      }),
    );
    expect(v.flags).not.toContain("implausible-reading");
    expect(v.implausibleReadings).toEqual([]);
  });
});
