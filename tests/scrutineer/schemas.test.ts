import { describe, expect, it } from "vitest";
import { demoRuleSet } from "@/db/seed/demo-rule-set";
import { localDateInZone } from "@/lib/scrutineer/calendar/local-date-in-zone";
import { entryDeclarationsSchema } from "@/lib/scrutineer/classes/entry-declarations-schema";
import { recordSchema } from "@/lib/scrutineer/records/record-schema";
import { ruleSetSchema } from "@/lib/scrutineer/rule-sets/rule-set-schema";
import { displayUnits } from "@/lib/scrutineer/units/display-units";
import { clubRuleSet, uuid7 } from "./fixtures";

const header = {
  id: uuid7(1),
  entryId: "e1",
  officialId: "s1",
  deviceId: "d1",
  deviceTime: "2026-05-16T09:00:00+01:00",
};

describe("rule-set schema", () => {
  it("accepts the demo rule set", () => {
    expect(ruleSetSchema.safeParse(demoRuleSet).success).toBe(true);
    expect(demoRuleSet.classes.map((c) => c.name)).toEqual([
      "Kestrel",
      "Merlin",
      "Harrier",
      "Peregrine",
    ]);
  });

  it("gives field-level errors for a broken rule set", () => {
    const rs = clubRuleSet();
    const [club] = rs.classes;
    if (club === undefined) throw new Error("fixture");
    rs.classes.push({ ...club });
    rs.classes[0] = { ...club, minPowerToWeight: 10 };
    rs.safety = {
      standards: [],
      checklist: [
        { id: "harness", label: "Harness", equipment: { acceptedStandardIds: ["fia-8853-98"] } },
      ],
    };
    const r = ruleSetSchema.safeParse(rs);
    expect(r.success).toBe(false);
    const issues = (r.error?.issues ?? []).map((i) => [i.path.join("."), i.message]);
    expect(issues).toEqual([
      ["classes.2.id", 'Class id "club" is used twice'],
      ["safety.checklist.0.equipment.acceptedStandardIds.0", 'Unknown standard "fia-8853-98"'],
      ["powerToWeight", "A class sets a power-to-weight minimum; say how it is measured"],
    ]);
  });

  it("rejects a class id that is not a slug", () => {
    const rs = clubRuleSet();
    const [club] = rs.classes;
    if (club === undefined) throw new Error("fixture");
    rs.classes[0] = { ...club, id: "Club A" };
    expect(ruleSetSchema.safeParse(rs).error?.issues[0]?.path).toEqual(["classes", 0, "id"]);
  });
});

describe("record schema", () => {
  it("accepts each kind of record", () => {
    const tape = { id: "t", name: "Tape", standardUncertainty: 1 };
    const records = [
      {
        ...header,
        kind: "reading",
        payload: { dimension: "wingOverhangMm", value: -12, instrument: tape },
      },
      {
        ...header,
        kind: "reading",
        payload: { dimension: "cornerWeightKg", corner: "lf", value: 310, instrument: tape },
      },
      {
        ...header,
        kind: "reading",
        payload: { dimension: "noiseDbA", value: 101.5, instrument: tape },
      },
      {
        ...header,
        kind: "checklist",
        payload: {
          itemId: "seat",
          result: "pass",
          equipment: {
            standardId: "fia-8855-1999",
            label: { form: "manufacture-month", year: 2013, month: 2 },
          },
        },
      },
      {
        ...header,
        kind: "photo",
        payload: { storageKey: "events/1/photos/x.jpg", caption: "wing side view" },
      },
      { ...header, kind: "note", payload: { text: "Entrant asked for a re-check after lunch" } },
      { ...header, kind: "void", payload: { targetRecordId: uuid7(2), reason: "wrong car" } },
      {
        ...header,
        kind: "override",
        payload: { status: "held", classId: null, reason: "Wing mount cracked" },
      },
    ];
    for (const r of records) expect(recordSchema.safeParse(r).success, r.kind).toBe(true);
  });

  it("rejects a non-v7 id, a corner weight without a corner, a negative height and an override without a class", () => {
    const tape = { id: "t", name: "Tape", standardUncertainty: 1 };
    const bad = [
      [
        {
          ...header,
          id: "0190a000-0000-4000-8000-000000000001",
          kind: "note",
          payload: { text: "x" },
        },
        "id",
      ],
      [
        {
          ...header,
          kind: "reading",
          payload: { dimension: "cornerWeightKg", value: 300, instrument: tape },
        },
        "payload.corner",
      ],
      [
        {
          ...header,
          kind: "reading",
          payload: { dimension: "wingTopFromGroundMm", value: -5, instrument: tape },
        },
        "payload.value",
      ],
      [
        {
          ...header,
          kind: "reading",
          payload: {
            dimension: "wingSpanMm",
            value: 1600,
            instrument: { ...tape, standardUncertainty: 0 },
          },
        },
        "payload.instrument.standardUncertainty",
      ],
      [
        {
          ...header,
          kind: "override",
          payload: { status: "cleared", classId: null, reason: "looks fine" },
        },
        "payload.classId",
      ],
      [
        { ...header, deviceTime: "2026-05-16 09:00", kind: "note", payload: { text: "x" } },
        "deviceTime",
      ],
    ] as const;
    for (const [record, path] of bad) {
      const r = recordSchema.safeParse(record);
      expect(r.success, path).toBe(false);
      expect(
        r.error?.issues.map((i) => i.path.join(".")),
        path,
      ).toContain(path);
    }
  });
});

describe("reading values a person can trust", () => {
  const tape = { id: "t", name: "Tape", standardUncertainty: 1 };
  const issues = (payload: object) =>
    (recordSchema.safeParse({ ...header, kind: "reading", payload }).error?.issues ?? []).map(
      (i) => [i.path.join("."), i.message],
    );

  it("refuses a length beyond 100 m, so two huge readings cannot overflow to Infinity", () => {
    // Source: common practice (no source) — no car is 100 m long; 1.7e308 + 1.7e308 overflows IEEE 754 doubles
    expect(issues({ dimension: "wingSpanMm", value: 1.7e308, instrument: tape })).toEqual([
      ["payload.value", "The wing span cannot be more than 100000 mm; check the number and unit"],
    ]);
    expect(issues({ dimension: "wingSpanMm", value: 100_000, instrument: tape })).toEqual([]);
    expect(
      issues({
        dimension: "bodyWidthMm",
        value: 1700,
        instrument: { ...tape, standardUncertainty: 1e300 },
      }).map(([path]) => path),
    ).toEqual(["payload.instrument.standardUncertainty"]);
  });

  it("caps corner weights and noise readings at plausible values", () => {
    // Source: common practice (no source) — a car's corner weighs well under 2000 kg; a static noise test reads well under 150 dB(A)
    expect(
      issues({ dimension: "cornerWeightKg", corner: "lf", value: 2500, instrument: tape }),
    ).toEqual([
      ["payload.value", "The corner weight cannot be more than 2000 kg; check the number and unit"],
    ]);
    expect(issues({ dimension: "noiseDbA", value: 1e6, instrument: tape })).toEqual([
      ["payload.value", "The noise cannot be more than 150 dB(A); check the number and unit"],
    ]);
    expect(
      issues({ dimension: "cornerWeightKg", corner: "lf", value: -1, instrument: tape }),
    ).toEqual([["payload.value", "The corner weight cannot be negative"]]);
  });

  it("words field messages with the people's names for dimensions, not internal ones", () => {
    const negative = issues({ dimension: "wingSpanMm", value: -5, instrument: tape });
    expect(negative).toEqual([["payload.value", "The wing span cannot be negative"]]);
    const unknown = issues({ dimension: "wingColour", value: 5, instrument: tape });
    expect(unknown).toHaveLength(1);
    expect(unknown[0]?.[0]).toBe("payload.dimension");
    expect(unknown[0]?.[1]).toMatch(/^Unknown dimension; a reading is one of: wing top height/);
    expect(unknown[0]?.[1]).not.toMatch(/Mm\b|DbA|Kg\b/);
  });
});

describe("dyno sheet air temperature", () => {
  const sheet = (value: number, unit: "C" | "F") => ({
    dynoSheet: {
      power: { value: 250, unit: "hp" },
      measuredAt: "wheel",
      correction: "std",
      ambient: { pressure: { value: 29.5, unit: "inHg" }, temperature: { value, unit } },
      date: "2026-04-01",
    },
  });

  it("checks the range after converting °F, and names the unit in the message", () => {
    // Source: NIST SP 811 App. B.8 — t/°C = (t/°F − 32)/1.8: 85 °F = 29.4 °C, 100 °F = 37.8 °C
    expect(entryDeclarationsSchema.safeParse(sheet(85, "F")).success).toBe(true);
    expect(entryDeclarationsSchema.safeParse(sheet(100, "F")).success).toBe(true);
    // The −60 to 70 °C bound is a plausibility check: common practice (no source).
    // −80 °F = −62.2 °C, below −60 °C = −76 °F; 160 °F = 71.1 °C, above 70 °C = 158 °F
    const cold = entryDeclarationsSchema.safeParse(sheet(-80, "F"));
    expect(cold.error?.issues.map((i) => [i.path.join("."), i.message])).toEqual([
      [
        "dynoSheet.ambient.temperature.value",
        "The dyno sheet's air temperature must be between -76 °F and 158 °F",
      ],
    ]);
    expect(entryDeclarationsSchema.safeParse(sheet(160, "F")).success).toBe(false);
    expect(entryDeclarationsSchema.safeParse(sheet(71, "C")).error?.issues[0]?.message).toBe(
      "The dyno sheet's air temperature must be between -60 °C and 70 °C",
    );
  });
});

describe("declarations and display", () => {
  it("fills declaration defaults", () => {
    expect(entryDeclarationsSchema.parse({})).toEqual({
      aero: { wing: false, splitter: false, diffuser: false },
      dynoSheet: null,
      tyres: null,
      modificationPoints: null,
      driverWeightKg: null,
      ballastKg: 0,
      engine: null,
    });
  });

  it("mass follows length unless given", () => {
    expect(displayUnits({ length: "in" })).toEqual({ length: "in", mass: "lb" });
    expect(displayUnits({ length: "mm", mass: "lb" })).toEqual({ length: "mm", mass: "lb" });
  });
});

describe("localDateInZone", () => {
  it("gives the venue's calendar date for an instant", () => {
    // Source: EU Directive 2000/84/EC Art. 2 — summer time from 01:00 UTC on the last Sunday of March (29 March 2026)
    expect(localDateInZone("2026-03-29T23:30:00Z", "Europe/London")).toBe("2026-03-30");
    expect(localDateInZone("2026-01-15T23:30:00Z", "Europe/London")).toBe("2026-01-15");
    // Source: US Energy Policy Act of 2005 §110 — daylight time in July; Pacific daylight time is UTC−7
    expect(localDateInZone("2026-07-04T05:00:00Z", "America/Los_Angeles")).toBe("2026-07-03");
    expect(localDateInZone(Date.UTC(2026, 6, 4, 12), "Australia/Sydney")).toBe("2026-07-04");
  });

  it("rejects an unknown zone or instant", () => {
    expect(() => localDateInZone("2026-07-04T05:00:00Z", "Mars/Olympus")).toThrow(RangeError);
    expect(() => localDateInZone("not a time", "Europe/London")).toThrow(RangeError);
  });
});
