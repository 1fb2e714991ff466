import { describe, expect, it } from "vitest";
import { demoRuleSet } from "@/db/seed/demo-rule-set";
import { displayUnits } from "@/lib/scrutineer/display-units";
import { entryDeclarationsSchema } from "@/lib/scrutineer/entry-declarations-schema";
import { localDateInZone } from "@/lib/scrutineer/local-date-in-zone";
import { recordSchema } from "@/lib/scrutineer/record-schema";
import { ruleSetSchema } from "@/lib/scrutineer/rule-set-schema";
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
