import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { convertLength } from "@/lib/scrutineer/units/convert-length";
import { convertMass } from "@/lib/scrutineer/units/convert-mass";
import { convertPower } from "@/lib/scrutineer/units/convert-power";
import { convertPowerToWeight } from "@/lib/scrutineer/units/convert-power-to-weight";
import { convertPressure } from "@/lib/scrutineer/units/convert-pressure";
import { convertTemperature } from "@/lib/scrutineer/units/convert-temperature";
import { formatLength } from "@/lib/scrutineer/units/format-length";
import { lengthTextSchema, parseLength } from "@/lib/scrutineer/units/parse-length";
import { spread } from "./fixtures";

describe("unit factors", () => {
  it("converts lengths, masses and powers with the exact factors", () => {
    expect(convertLength(1, "in", "mm")).toBe(25.4); // Source: NIST SP 811 App. B.8 — 1 in = 25.4 mm exactly
    expect(convertLength(1, "ft", "mm")).toBeCloseTo(304.8, 12); // Source: NIST SP 811 App. B.8 — 1 ft = 0.3048 m exactly
    expect(convertMass(1, "lb", "kg")).toBe(0.45359237); // Source: NIST SP 811 App. B.8 — 1 lb = 0.45359237 kg exactly
    expect(convertPower(1, "hp", "W")).toBeCloseTo(745.69987158227, 8); // Source: NIST SP 811 App. B.8 — 1 hp (550 ft·lbf/s) = 745.69987158227 W
    expect(convertPower(1, "PS", "W")).toBeCloseTo(735.49875, 9); // Source: NIST SP 811 App. B.8 — 1 PS (metric hp) = 735.49875 W exactly
  });

  it("converts power-to-weight ratios", () => {
    expect(convertPowerToWeight(10, "lb/hp", "kg/hp")).toBeCloseTo(4.5359237, 12); // Source: NIST SP 811 App. B.8 — 10 lb/hp = 4.5359237 kg/hp
    expect(convertPowerToWeight(10, "lb/hp", "kg/kW")).toBeCloseTo(6.08277, 5); // Source: NIST SP 811 App. B.8 factors — 10 lb/hp = 6.08277 kg/kW (DOMAIN.md check value)
    expect(
      convertPowerToWeight(convertPowerToWeight(7.3, "kg/PS", "lb/hp"), "lb/hp", "kg/PS"),
    ).toBeCloseTo(7.3, 12);
  });

  it("converts 200 mm to inches", () => {
    expect(convertLength(200, "mm", "in")).toBeCloseTo(7.874015748, 9); // Source: NIST SP 811 App. B.8 — 200 mm = 7.874015748 in
  });

  it("converts dyno-sheet pressures and temperatures", () => {
    expect(convertPressure(1, "mbar", "kPa")).toBe(0.1); // Source: NIST SP 811 App. B.8 — 1 mbar = 100 Pa exactly
    expect(convertPressure(1, "inHg", "kPa")).toBeCloseTo(3.386389, 9); // Source: NIST SP 811 App. B.8 — inch of mercury, conventional = 3.386389 kPa
    expect(convertTemperature(60, "F", "C")).toBeCloseTo(15.5555556, 6); // Source: NIST SP 811 App. B.8 — t/°C = (t/°F − 32)/1.8
    expect(convertTemperature(25, "C", "F")).toBe(77); // Source: NIST SP 811 App. B.8 — t/°F = 1.8·t/°C + 32
  });
});

describe("parseLength", () => {
  it("reads the same length written three ways", () => {
    // Source: NIST SP 811 App. B.8 — 64.5 in × 25.4 mm/in = 1638.3 mm
    for (const text of [
      "64.5 in",
      "1638.3 mm",
      '64 1/2"',
      "64-1/2 in",
      "64½ in",
      "5' 4 1/2\"",
      "5 ft 4.5 in",
      "163.83 cm",
    ]) {
      const r = parseLength(text);
      expect(r.ok, text).toBe(true);
      if (r.ok) expect(r.mm, text).toBeCloseTo(1638.3, 9);
    }
  });

  it("reads an end plate written as a fraction", () => {
    const r = parseLength("1/4 in");
    expect(r).toEqual({ ok: true, mm: 6.35, unit: "in" }); // Source: NIST SP 811 App. B.8 — 0.25 × 25.4 = 6.35 mm
  });

  it("uses the event's unit when the text has none, and only then", () => {
    expect(parseLength("203.2", { defaultUnit: "mm" })).toEqual({
      ok: true,
      mm: 203.2,
      unit: "mm",
    });
    expect(parseLength("8", { defaultUnit: "in" })).toEqual({ ok: true, mm: 203.2, unit: "in" }); // Source: NIST SP 811 App. B.8 — 8 in = 203.2 mm
    const bare = parseLength("203.2");
    expect(bare.ok).toBe(false);
    if (!bare.ok) expect(bare.message).toMatch(/unit/i);
  });

  it("accepts a negative overhang only when the reading is signed", () => {
    expect(parseLength("-12 mm").ok).toBe(false);
    expect(parseLength("−12 mm", { allowNegative: true })).toEqual({
      ok: true,
      mm: -12,
      unit: "mm",
    });
  });

  it("rejects nonsense with a message a person can act on", () => {
    const cases: Array<[string, RegExp]> = [
      ["", /enter a length/i],
      ["abc", /could not read/i],
      ["12 furlongs", /unknown unit "furlongs"/i],
      ["64..5 in", /could not read the number/i],
      ["1/0 in", /0 below the line/i],
      ["1,638.3 mm", /point for decimals/i],
      ["5000 m", /longer than any car/i],
      ["1 m 20", /check the order/i],
    ];
    for (const [text, message] of cases) {
      const r = parseLength(text);
      expect(r.ok, text).toBe(false);
      if (!r.ok) expect(r.message, text).toMatch(message);
    }
  });

  it("reads two apostrophes as inches and a number ending in a point", () => {
    // Source: common practice (no source) — '' typed for " on keyboards without it
    expect(parseLength("6''")).toEqual({ ok: true, mm: 6 * 25.4, unit: "in" }); // Source: NIST SP 811 App. B.8 — 1 in = 25.4 mm exactly
    expect(parseLength("5' 4''")).toMatchObject({ ok: true, unit: "in" });
    const r = parseLength("5. in");
    expect(r).toEqual({ ok: true, mm: 127, unit: "in" }); // Source: NIST SP 811 App. B.8 — 5 in = 127 mm
  });

  it("says which part to fix: the number, the unit, or the order", () => {
    const message = (text: string) => {
      const r = parseLength(text);
      return r.ok ? "accepted" : r.message;
    };
    // A malformed number is the number's fault, with or without a unit.
    expect(message("12..5")).toMatch(/^Could not read the number in "12\.\.5"/);
    expect(message("12..5")).not.toMatch(/add a unit/i);
    // A unit typed in another script is an unknown unit, not a missing one.
    expect(message("12 мм")).toMatch(/^Unknown unit "мм"/);
    // Inches before a bare number: the order is wrong.
    expect(message('5" 3')).toMatch(
      /^Check the order in "5" 3": the unit goes after the number, and feet before inches/,
    );
  });

  it("offers the parser as a zod schema with the message as the issue", () => {
    expect(lengthTextSchema().parse("5 in")).toBeCloseTo(127, 12); // Source: NIST SP 811 App. B.8 — 5 in = 127 mm
    const bad = lengthTextSchema().safeParse("five inches");
    expect(bad.success).toBe(false);
    expect(bad.error?.issues[0]?.message).toMatch(/could not read/i);
  });
});

describe("formatLength", () => {
  it("shows the event's unit at display resolution", () => {
    expect(formatLength(1638.3, "in")).toBe("64.5 in");
    expect(formatLength(203.2, "mm")).toBe("203.2 mm");
    expect(formatLength(133.35, "in")).toBe("5.25 in");
    expect(formatLength(-0.01, "mm")).toBe("0 mm");
  });

  it("in → mm → in is stable to 0.001 in, through text both ways", () => {
    fc.assert(
      fc.property(fc.integer({ min: 0, max: 2_000_000 }), (thousandths) => {
        const inches = thousandths / 1000;
        const parsed = parseLength(`${inches} in`);
        if (!parsed.ok) return false;
        const shown = formatLength(parsed.mm, "in", 3);
        const again = parseLength(shown);
        if (!again.ok) return false;
        // Source: NIST SP 811 App. B.8 — 1 in = 25.4 mm exactly, so nothing is lost but rounding
        return Math.abs(convertLength(again.mm, "mm", "in") - inches) <= 0.001;
      }),
    );
  });

  it("mm → in → mm numerically keeps full precision", () => {
    fc.assert(
      fc.property(spread(-5000, 5000), (mm) => {
        return Math.abs(convertLength(convertLength(mm, "mm", "in"), "in", "mm") - mm) <= 1e-9;
      }),
    );
  });
});
