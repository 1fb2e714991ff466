import fc from "fast-check";
import { describe, expect, it } from "vitest";
import {
  type EntryDeclarationsInput,
  entryDeclarationsSchema,
} from "@/lib/scrutineer/classes/entry-declarations-schema";
import type { Corner, TechRecord } from "@/lib/scrutineer/records/record-schema";
import type { RuleSetInput } from "@/lib/scrutineer/rule-sets/rule-set-schema";
import { evaluateEntry } from "@/lib/scrutineer/verdicts/evaluate-entry";
import type { EvaluateEntryInput } from "@/lib/scrutineer/verdicts/evaluate-entry-input-schema";
import { clubRuleSet, input, reading } from "./fixtures";

// Issue 8, item 13: a dyno sheet that cannot be true is refused (at the schema, and by the engine
// for a sheet stored before the check), never thrown.

const corners = (kg: Record<Corner, number>): TechRecord[] =>
  (Object.entries(kg) as Array<[Corner, number]>).map(([corner, value], i) =>
    reading(10 + i, {
      dimension: "cornerWeightKg",
      corner,
      value,
      instrument: { id: `scale-${corner}`, name: "Corner scale", standardUncertainty: 1 },
    }),
  );
/** Scales 1200 kg + 80 kg declared driver = 1280 kg (test values). */
const weights = corners({ lf: 330, rf: 320, lr: 280, rr: 270 });

const rules = (minFirst: number): RuleSetInput => {
  const base = clubRuleSet();
  return {
    ...base,
    classes: base.classes.map((c, i) => ({ ...c, minPowerToWeight: i === 0 ? minFirst : null })),
    powerToWeight: {
      unit: "lb/hp",
      weightBasis: "with-driver",
      driverMass: { kind: "declared" },
      ballastCounts: true,
      powerMeasuredAt: "wheel",
      crankToWheelFactor: null,
      correction: "sae-j1349",
      dynoSheetValidYears: 3,
    },
  };
};

/** A 200 hp wheel figure in the older STD correction, at 1013 mbar and 25 °C. */
const stdSheet: EntryDeclarationsInput = {
  driverWeightKg: 80,
  dynoSheet: {
    power: { value: 200, unit: "hp" },
    measuredAt: "wheel",
    correction: "std",
    ambient: { pressure: { value: 1013, unit: "mbar" }, temperature: { value: 25, unit: "C" } },
    date: "2025-09-01",
  },
};

/** The input with the stored sheet's ambient replaced, as a row saved before the check reads. */
function withStoredAmbient(base: EvaluateEntryInput, ambient: unknown): EvaluateEntryInput {
  const sheet = base.entry.declarations.dynoSheet;
  if (sheet === null) throw new Error("fixture has a sheet");
  return {
    ...base,
    entry: {
      ...base.entry,
      declarations: {
        ...base.entry.declarations,
        dynoSheet: { ...sheet, ambient: ambient as typeof sheet.ambient },
      },
    },
  };
}

const powerRule = (v: ReturnType<typeof evaluateEntry>) =>
  v.classChecks[0]?.rules.find((r) => r.ruleId === "power-to-weight");

describe("a stored dyno sheet that cannot be true, through evaluateEntry", () => {
  const base = input({
    ruleSet: rules(16),
    records: weights,
    declaredClassId: "club",
    declarations: stdSheet,
  });

  it("a true sheet: 1280 kg on about 192 hp is too quick for 16 lb/hp, so the car moves up", () => {
    // Worked here: STD → J1349 multiplies by about 0.96 (DOMAIN.md: STD reads about 4 % higher);
    // 1280 kg / 0.45359237 = 2821.9 lb (NIST SP 811 App. B.8) / 192 hp ≈ 14.7 lb/hp < 16.
    const v = evaluateEntry(base);
    expect(powerRule(v)?.outcome).toBe("fail");
    expect(v.status).toBe("moved-up");
  });

  it("2,000 mbar does not clear that car: the sheet is refused in words", () => {
    // Source: WMO World Weather & Climate Extremes Archive — highest sea-level pressure on record
    // 1083.8 hPa (Agata, 31 Dec 1968). At 2,000 mbar the J1349/STD ratio drops to about 0.79,
    // which would make the same car 18 lb/hp and clear it.
    const v = evaluateEntry(
      withStoredAmbient(base, {
        pressure: { value: 2000, unit: "mbar" },
        temperature: { value: 25, unit: "C" },
      }),
    );
    expect(v.status).not.toBe("cleared");
    expect(powerRule(v)?.outcome).toBe("waiting");
    expect(powerRule(v)?.reason).toBe(
      "Power-to-weight: the dyno sheet cannot be true: its air pressure 2,000 mbar is outside what weather and altitude give (500–1,100 mbar); it is not accepted — check the figures on the sheet.",
    );
  });

  it("vapour pressure at or above the air pressure is refused, never thrown", () => {
    const v = evaluateEntry(
      withStoredAmbient(base, {
        pressure: { value: 1000, unit: "mbar" },
        vapourPressure: { value: 1000, unit: "mbar" },
        temperature: { value: 20, unit: "C" },
      }),
    );
    expect(powerRule(v)?.outcome).toBe("waiting");
    expect(powerRule(v)?.reason).toMatch(
      /the dyno sheet cannot be true: its vapour pressure 1,000 mbar is not below its air pressure 1,000 mbar/,
    );
  });

  it("never throws, whatever pressures and temperature a stored sheet carries", () => {
    const pressure = fc.record({
      value: fc.double({ min: 0.001, max: 5000, noNaN: true }),
      unit: fc.constantFrom("kPa", "hPa", "mbar", "inHg"),
    });
    fc.assert(
      fc.property(
        pressure,
        fc.option(pressure, { nil: undefined }),
        fc.double({ min: -59, max: 69, noNaN: true }),
        (p, vapour, t) => {
          const ambient = {
            pressure: p,
            ...(vapour === undefined ? {} : { vapourPressure: vapour }),
            temperature: { value: t, unit: "C" },
          };
          const v = evaluateEntry(withStoredAmbient(base, ambient));
          expect(["pass", "fail", "inconclusive", "waiting"]).toContain(powerRule(v)?.outcome);
        },
      ),
      { numRuns: 400 },
    );
  });
});

describe("the declarations schema refuses a dyno sheet that cannot be true", () => {
  const declare = (ambient: Record<string, unknown>) =>
    entryDeclarationsSchema.safeParse({
      ...stdSheet,
      dynoSheet: { ...stdSheet.dynoSheet, ambient },
    });
  const at = (value: number, unit: string, extra: Record<string, unknown> = {}) => ({
    pressure: { value, unit },
    temperature: { value: 25, unit: "C" },
    ...extra,
  });

  it("accepts sea-level and high-altitude pressures", () => {
    // Source: ISO 2533:1975 standard atmosphere — 1013.25 hPa at sea level, about 616 hPa at
    // 4,000 m (worked here: 1013.25 × (1 − 2.25577e-5 × 4000)^5.25588); 29.92 inHg standard day.
    expect(declare(at(1013.25, "hPa")).success).toBe(true);
    expect(declare(at(616, "hPa")).success).toBe(true);
    expect(declare(at(29.92, "inHg")).success).toBe(true);
    expect(declare(at(101.3, "kPa")).success).toBe(true);
  });

  it("refuses air pressure no weather or altitude gives, naming it and the range", () => {
    // Source: WMO World Weather & Climate Extremes Archive — highest sea-level pressure 1083.8 hPa.
    const heavy = declare(at(2000, "mbar"));
    expect(heavy.success).toBe(false);
    expect(heavy.error?.issues[0]?.message).toBe(
      "The dyno sheet cannot be true: its air pressure 2,000 mbar is outside what weather and altitude give (500–1,100 mbar); check the figures on the sheet",
    );
    expect(heavy.error?.issues[0]?.path).toEqual(["dynoSheet", "ambient"]);
    // Source: ISO 2533:1975 — about 533 hPa at 5,100 m, the highest towns; 400 hPa is higher than
    // anyone runs a dyno.
    expect(declare(at(400, "hPa")).success).toBe(false);
    expect(declare(at(200, "kPa")).success).toBe(false);
  });

  it("refuses vapour pressure at or above the air pressure, or above saturation", () => {
    const steam = declare(at(1000, "mbar", { vapourPressure: { value: 1000, unit: "mbar" } }));
    expect(steam.error?.issues[0]?.message).toMatch(
      /its vapour pressure 1,000 mbar is not below its air pressure 1,000 mbar/,
    );
    // Source: WMO-No. 8 (CIMO Guide) Annex 4.B — e_w(25 °C) = 6.112 × exp(17.62 × 25 / 268.12)
    // = 31.6 hPa (worked here): 20 hPa can be true, 50 hPa cannot.
    expect(declare(at(1000, "mbar", { vapourPressure: { value: 20, unit: "hPa" } })).success).toBe(
      true,
    );
    const wet = declare(at(1000, "mbar", { vapourPressure: { value: 50, unit: "hPa" } }));
    expect(wet.error?.issues[0]?.message).toMatch(
      /its vapour pressure 50 hPa is more than air at 25 °C can hold \(31\.6 hPa\)/,
    );
  });
});
