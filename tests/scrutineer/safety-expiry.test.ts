import { describe, expect, it } from "vitest";
import type { TechRecord } from "@/lib/scrutineer/records/record-schema";
import type { RuleSetInput } from "@/lib/scrutineer/rule-sets/rule-set-schema";
import { ruleSetSchema } from "@/lib/scrutineer/rule-sets/rule-set-schema";
import { checkEquipmentValidity } from "@/lib/scrutineer/safety/check-equipment-validity";
import type { EquipmentLabel } from "@/lib/scrutineer/safety/equipment-label-schema";
import type { SafetyStandard } from "@/lib/scrutineer/safety/safety-rules-schema";
import { evaluateEntry } from "@/lib/scrutineer/verdicts/evaluate-entry";
import { checklist, clubRuleSet, input, lengthReading } from "./fixtures";

const std = (s: Omit<SafetyStandard, "item"> & { item?: string }): SafetyStandard => ({
  item: "test",
  ...s,
});
const on = (standard: SafetyStandard, label: EquipmentLabel, eventDate: string, warningDays = 0) =>
  checkEquipmentValidity({ standard, label, eventDate, warningDays });
/** Valid on the day (an item on its last valid day also carries the expiring-soon warning). */
const validOn = (standard: SafetyStandard, label: EquipmentLabel, eventDate: string) =>
  on(standard, label, eventDate).status !== "expired" &&
  on(standard, label, eventDate).status !== "unreadable";

describe("safety equipment validity on the event date", () => {
  it("FIA 8853/98 labelled 2020 is valid on 2020-12-31 and not on 2021-01-01", () => {
    // Source: FIA Appendix J practice as published by clubs — label year Y → valid through 31 Dec Y
    const s = std({
      id: "fia-8853-98",
      name: "FIA 8853/98",
      labelForm: "not-valid-after-year",
      policy: { kind: "end-of-label-year" },
    });
    const label = { form: "not-valid-after-year", year: 2020 } as const;
    expect(validOn(s, label, "2020-12-31")).toBe(true);
    expect(on(s, label, "2021-01-01").status).toBe("expired");
  });

  it("FIA 8853-2016 labelled 2025, 5 years after the label year, is valid through 2030-12-31", () => {
    // Source: Motorsport UK NCR 2026 Ch.7 App.7 Arts 10.4–10.7 — national events: up to 5 years after the label year
    const s = std({
      id: "fia-8853-2016",
      name: "FIA 8853-2016",
      labelForm: "manufacture-year",
      policy: { kind: "years-after-label-year", years: 5 },
    });
    const label = { form: "manufacture-year", year: 2025 } as const;
    expect(validOn(s, label, "2030-12-31")).toBe(true);
    expect(on(s, label, "2030-12-31")).toMatchObject({ validThrough: "2030-12-31", daysLeft: 0 });
    expect(on(s, label, "2031-01-01").status).toBe("expired");
  });

  it("an FIA 8855-1999 seat labelled 02/2013 is valid through 2018-02-28", () => {
    // Source: FIA Appendix J Art. 253 as quoted — 5 years from the label's manufacture date
    const s = std({
      id: "fia-8855-1999",
      name: "FIA 8855-1999",
      labelForm: "manufacture-month",
      policy: { kind: "years-from-label-month", years: 5 },
    });
    const label = { form: "manufacture-month", year: 2013, month: 2 } as const;
    expect(validOn(s, label, "2018-02-28")).toBe(true);
    expect(on(s, label, "2018-02-28")).toMatchObject({ validThrough: "2018-02-28" });
    expect(on(s, label, "2018-03-01").status).toBe("expired");
  });

  it("an SFI 38.1 sticker 05/2011 under a 5-year policy expires 05/2016", () => {
    // Source: sanctioning-body notice on SFI 38.1 — recertify 5 years after the sticker month/year.
    // "Expires 05/2016" is read as valid through the end of that month, like the seat rule above.
    const s = std({
      id: "sfi-38-1",
      name: "SFI 38.1",
      labelForm: "manufacture-month",
      policy: { kind: "years-from-label-month", years: 5 },
    });
    const label = { form: "manufacture-month", year: 2011, month: 5 } as const;
    expect(validOn(s, label, "2016-05-31")).toBe(true);
    expect(on(s, label, "2016-05-31")).toMatchObject({ validThrough: "2016-05-31" });
    expect(on(s, label, "2016-06-01").status).toBe("expired");
  });

  it("SFI 16.1 under one club's rule: made 2014 → through 2019-12-31", () => {
    // Source: SCCA GCR 2017 9.3.18.E.1 — 31 Dec of the 5th year after manufacture
    const s = std({
      id: "sfi-16-1",
      name: "SFI 16.1",
      labelForm: "manufacture-year",
      policy: { kind: "years-after-label-year", years: 5 },
    });
    expect(on(s, { form: "manufacture-year", year: 2014 }, "2019-12-31").validThrough).toBe(
      "2019-12-31",
    );
    expect(on(s, { form: "manufacture-year", year: 2014 }, "2020-01-01").status).toBe("expired");
  });

  it("a helmet standard accepted through a fixed date", () => {
    // Source: Motorsport UK helmet list 2024 — SA2015 not valid after 2026-12-31
    const s = std({
      id: "snell-sa2015",
      name: "Snell SA2015",
      labelForm: "standard-only",
      policy: { kind: "valid-through-date", date: "2026-12-31" },
    });
    expect(validOn(s, { form: "standard-only" }, "2026-12-31")).toBe(true);
    expect(on(s, { form: "standard-only" }, "2027-01-01").status).toBe("expired");
  });

  it("an extinguisher checked no more than 2 years before the event", () => {
    // Source: Motorsport UK NCR 2026 Ch.7 App.6 Arts 3.3–4.1 — check date ≤ 2 years old
    const s = std({
      id: "ext",
      name: "Extinguisher check",
      labelForm: "date",
      policy: { kind: "years-from-label-date", years: 2 },
    });
    expect(validOn(s, { form: "date", date: "2024-05-16" }, "2026-05-16")).toBe(true);
    expect(on(s, { form: "date", date: "2024-05-16" }, "2026-05-17").status).toBe("expired");
    expect(on(s, { form: "date", date: "2024-02-29" }, "2026-02-28").validThrough).toBe(
      "2026-02-28",
    ); // Source: ISO 8601 Gregorian calendar — 2026 has no 29 Feb
  });

  it("warns when the last valid day falls within the warning window", () => {
    // Source: the rule set's expiryWarningDays (30 in the brief) — a product setting, not a trade source
    const s = std({
      id: "fia-8853-98",
      name: "FIA 8853/98",
      labelForm: "not-valid-after-year",
      policy: { kind: "end-of-label-year" },
    });
    const label = { form: "not-valid-after-year", year: 2026 } as const;
    expect(on(s, label, "2026-12-01", 30)).toMatchObject({ status: "expires-soon", daysLeft: 30 });
    expect(on(s, label, "2026-11-30", 30).status).toBe("valid");
  });

  it("cannot read a label the policy does not use", () => {
    const s = std({
      id: "x",
      name: "X",
      labelForm: "manufacture-month",
      policy: { kind: "years-from-label-month", years: 5 },
    });
    expect(on(s, { form: "manufacture-year", year: 2020 }, "2022-01-01").status).toBe("unreadable");
  });
});

describe("safety in the verdict", () => {
  const withSafety = (): RuleSetInput => ({
    ...clubRuleSet(),
    safety: {
      expiryWarningDays: 30,
      standards: [
        // Source: FIA Appendix J practice as published by clubs — label year Y → valid through 31 Dec Y
        {
          id: "fia-8853-98",
          name: "FIA 8853/98",
          item: "harness",
          labelForm: "not-valid-after-year",
          policy: { kind: "end-of-label-year" },
        },
      ],
      checklist: [
        { id: "harness", label: "Harness", equipment: { acceptedStandardIds: ["fia-8853-98"] } },
        { id: "battery", label: "Battery secured" },
      ],
    },
  });
  const aeroOk = [
    lengthReading(1, "wingTopFromGroundMm", 1400),
    lengthReading(2, "roofPeakFromGroundMm", 1300),
    lengthReading(3, "wingOverhangMm", 50),
    lengthReading(4, "wingSpanMm", 1500),
    lengthReading(5, "bodyWidthMm", 1600),
  ];
  const harness = (n: number, year: number) =>
    checklist(n, {
      itemId: "harness",
      result: "pass",
      equipment: { standardId: "fia-8853-98", label: { form: "not-valid-after-year", year } },
    });

  it("an expired harness holds the car, whatever the aero says", () => {
    const v = evaluateEntry(
      input({
        ruleSet: withSafety(),
        records: [...aeroOk, harness(6, 2025), checklist(7, { itemId: "battery", result: "pass" })],
        declaredClassId: "club",
        eventDate: "2026-05-16",
      }),
    );
    expect(v.status).toBe("held");
    expect(v.classId).toBeNull();
    expect(v.reason).toBe(
      'Held — fix and re-present: harness FIA 8853/98 (label "not valid after 2025"): expired, valid only through 2025-12-31.',
    );
    expect(v.safety[0]?.reason).toMatch(/— held: fix and re-present\.$/);
  });

  it("safety never moves a car up: a failed item holds a car that is also over a class limit", () => {
    // Source: DOMAIN.md — safety failures never move a car up; they stop it (fix and re-present, Motorsport UK NCR 2026 Ch.5 Part A App.6 Art.2.15)
    const overhangOver = [
      ...aeroOk.slice(0, 2),
      lengthReading(3, "wingOverhangMm", 300),
      ...aeroOk.slice(3),
    ];
    const v = evaluateEntry(
      input({
        ruleSet: withSafety(),
        records: [
          ...overhangOver,
          harness(6, 2027),
          checklist(7, { itemId: "battery", result: "fail", comment: "loose clamp" }),
        ],
        declaredClassId: "club",
      }),
    );
    expect(v.status).toBe("held");
    expect(v.reason).toBe(
      "Held — fix and re-present: battery secured: failed at the tech line (loose clamp).",
    );
  });

  it("fix and re-present: the later pass replaces the earlier fail", () => {
    const v = evaluateEntry(
      input({
        ruleSet: withSafety(),
        records: [
          ...aeroOk,
          harness(6, 2027),
          checklist(7, { itemId: "battery", result: "fail" }, 10),
          checklist(8, { itemId: "battery", result: "pass" }, 40),
        ],
        declaredClassId: "club",
      }),
    );
    expect(v.status).toBe("cleared");
  });

  it("waits for unchecked items, and flags equipment about to expire", () => {
    const waiting = evaluateEntry(
      input({
        ruleSet: withSafety(),
        records: [...aeroOk, harness(6, 2027)],
        declaredClassId: "club",
      }),
    );
    expect(waiting.status).toBe("waiting");
    expect(waiting.missing).toEqual(["Battery secured"]);
    const soon = evaluateEntry(
      input({
        ruleSet: withSafety(),
        records: [...aeroOk, harness(6, 2026), checklist(7, { itemId: "battery", result: "pass" })],
        declaredClassId: "club",
        eventDate: "2026-12-20",
      }),
    );
    expect(soon.status).toBe("cleared");
    expect(soon.flags).toContain("expires-soon");
    expect(soon.reason).toMatch(/harness expires within 30 days\.$/);
  });

  it("the rule set refuses a policy that cannot read its standard's label", () => {
    const bad = withSafety();
    const r = ruleSetSchema.safeParse({
      ...bad,
      safety: {
        ...bad.safety,
        standards: [
          {
            id: "fia-8853-98",
            name: "FIA 8853/98",
            item: "harness",
            labelForm: "standard-only",
            policy: { kind: "years-from-label-month", years: 5 },
          },
        ],
      },
    });
    expect(r.success).toBe(false);
    expect(r.error?.issues[0]?.path).toEqual(["safety", "standards", 0, "policy"]);
  });
});

describe("labels that must be re-read, and safety wording", () => {
  // Source: Motorsport UK NCR 2026 Ch.7 App.7 Arts 10.4–10.7 — FIA 8853-2016 at national events:
  // up to 5 years after the label year, the label carrying the year of manufacture.
  const fia8853_2016 = {
    id: "fia-8853-2016",
    name: "FIA 8853-2016",
    item: "harness",
    labelForm: "manufacture-year",
    policy: { kind: "years-after-label-year", years: 5 },
  } as const;
  // Source: FIA Appendix J Art. 253 as quoted — seat FIA 8855-1999: 5 years from the label's manufacture date
  const fia8855_1999 = {
    id: "fia-8855-1999",
    name: "FIA 8855-1999",
    item: "seat",
    labelForm: "manufacture-month",
    policy: { kind: "years-from-label-month", years: 5 },
  } as const;
  // Source: Motorsport UK NCR 2026 Ch.7 App.6 Arts 3.3–4.1 — extinguisher check date ≤ 2 years old
  const extinguisherCheck = {
    id: "extinguisher-service",
    name: "Extinguisher service check",
    item: "extinguisher",
    labelForm: "date",
    policy: { kind: "years-from-label-date", years: 2 },
  } as const;
  const rules = (): RuleSetInput => ({
    ...clubRuleSet(),
    safety: {
      expiryWarningDays: 30,
      standards: [fia8853_2016, fia8855_1999, extinguisherCheck],
      checklist: [
        { id: "harness", label: "Harness", equipment: { acceptedStandardIds: ["fia-8853-2016"] } },
        {
          id: "seat",
          label: "Seat",
          required: false,
          equipment: { acceptedStandardIds: ["fia-8855-1999"] },
        },
        {
          id: "extinguisher",
          label: "Fire extinguisher",
          required: false,
          equipment: { acceptedStandardIds: ["extinguisher-service"] },
        },
      ],
    },
  });
  const aeroOk = [
    lengthReading(1, "wingTopFromGroundMm", 1400),
    lengthReading(2, "roofPeakFromGroundMm", 1300),
    lengthReading(3, "wingOverhangMm", 50),
    lengthReading(4, "wingSpanMm", 1500),
    lengthReading(5, "bodyWidthMm", 1600),
  ];
  const item = (
    n: number,
    itemId: string,
    equipment?: Extract<TechRecord, { kind: "checklist" }>["payload"]["equipment"],
  ) => checklist(n, { itemId, result: "pass", ...(equipment ? { equipment } : {}) });
  const judge = (records: TechRecord[], eventDate: string) =>
    evaluateEntry(
      input({
        ruleSet: rules(),
        records: [...aeroOk, ...records],
        declaredClassId: "club",
        eventDate,
      }),
    );

  it("never passes a label recorded in another form than the standard's: it is re-read", () => {
    // Read as "not valid after 2030", an 8853-2016 label would run to 2035-12-31 — but its year is
    // the year of manufacture, so the harness may have expired long before. It must not pass.
    const v = judge(
      [
        item(6, "harness", {
          standardId: "fia-8853-2016",
          label: { form: "not-valid-after-year", year: 2030 },
        }),
      ],
      "2032-06-01",
    );
    const harness = v.safety.find((s) => s.itemId === "harness");
    expect(harness?.outcome).toBe("waiting");
    expect(harness?.equipment).toMatchObject({ status: "unreadable", validThrough: null });
    expect(harness?.reason).toBe(
      'Harness label recorded as "not valid after 2030", but FIA 8853-2016 labels carry the year of manufacture; re-read the label.',
    );
    expect(v.status).toBe("waiting");
    expect(v.missing).toEqual(["re-read the harness label"]);
    expect(v.reason).toBe("Waiting — still to do: re-read the harness label.");
  });

  it("re-reads a label dated after the event day", () => {
    const harnessMade = (year: number) =>
      item(6, "harness", {
        standardId: "fia-8853-2016",
        label: { form: "manufacture-year", year },
      });
    // Source: common practice (no source) — a label cannot carry a manufacture date later than the day it is read
    const future = judge([harnessMade(2027)], "2026-05-16");
    expect(future.safety[0]?.reason).toBe(
      "Harness label recorded as made 2027, after the event day (2026-05-16); re-read the label.",
    );
    expect(future.status).toBe("waiting");
    expect(judge([harnessMade(2026)], "2026-05-16").status).toBe("cleared");

    const seatMade = (year: number, month: number) =>
      item(7, "seat", {
        standardId: "fia-8855-1999",
        label: { form: "manufacture-month", year, month },
      });
    const seat = (v: ReturnType<typeof judge>) => v.safety.find((s) => s.itemId === "seat");
    expect(
      seat(judge([harnessMade(2025), seatMade(2026, 6)], "2026-05-16"))?.equipment?.status,
    ).toBe("unreadable");
    expect(seat(judge([harnessMade(2025), seatMade(2026, 5)], "2026-05-16"))?.outcome).toBe("pass");

    const checked = (date: string) =>
      item(8, "extinguisher", {
        standardId: "extinguisher-service",
        label: { form: "date", date },
      });
    const ext = (v: ReturnType<typeof judge>) => v.safety.find((s) => s.itemId === "extinguisher");
    expect(ext(judge([harnessMade(2025), checked("2026-05-17")], "2026-05-16"))?.outcome).toBe(
      "waiting",
    );
    expect(ext(judge([harnessMade(2025), checked("2026-05-16")], "2026-05-16"))?.outcome).toBe(
      "pass",
    );
  });

  it("names the extinguisher once, and counts a single day as a day", () => {
    // Source: Motorsport UK NCR 2026 Ch.7 App.6 Arts 3.3–4.1 — checked 2024-05-17 + 2 years → valid through 2026-05-17
    const v = judge(
      [
        item(6, "harness", {
          standardId: "fia-8853-2016",
          label: { form: "manufacture-year", year: 2025 },
        }),
        item(7, "extinguisher", {
          standardId: "extinguisher-service",
          label: { form: "date", date: "2024-05-17" },
        }),
      ],
      "2026-05-16",
    );
    expect(v.safety.find((s) => s.itemId === "extinguisher")?.reason).toBe(
      "Fire extinguisher service check (dated 2024-05-17): valid through 2026-05-17 — expires in 1 day.",
    );
  });

  it("asks for the item's standard and label by name when a pass is recorded without them", () => {
    const v = judge([item(6, "harness")], "2026-05-16");
    expect(v.status).toBe("waiting");
    expect(v.missing).toEqual(["record the harness standard and label"]);
    expect(v.reason).toBe("Waiting — still to do: record the harness standard and label.");
  });

  it("says a standard is not accepted without showing an internal id", () => {
    const unknown = judge(
      [
        item(6, "harness", {
          standardId: "made-up-std",
          standardName: "Made-up harness standard",
          label: { form: "manufacture-year", year: 2024 },
        }),
      ],
      "2026-05-16",
    );
    expect(unknown.status).toBe("held");
    expect(unknown.safety[0]?.reason).toBe(
      "Harness: Made-up harness standard (as recorded) is a standard this rule set does not accept — held: fix and re-present.",
    );
    const nameless = judge(
      [
        item(6, "harness", {
          standardId: "made-up-std",
          label: { form: "manufacture-year", year: 2024 },
        }),
      ],
      "2026-05-16",
    );
    expect(nameless.safety[0]?.reason).toBe(
      "Harness: recorded with a standard this rule set does not accept — held: fix and re-present.",
    );
    expect(nameless.reason).not.toContain("made-up-std");
  });
});
