import { parse } from "csv-parse/sync";
import { describe, expect, it } from "vitest";
import { chiefReportCsv } from "@/lib/results/chief-report-csv";
import { type StoredVerdict, shapeChiefReport } from "@/lib/results/shape-chief-report";
import type { Verdict } from "@/lib/scrutineer/verdicts/verdict-schema";
import { lengthReading } from "../scrutineer/fixtures";
import {
  entry,
  IN,
  overhangLong,
  overhangStops,
  override,
  verdictFor,
  voidRecord,
  wingHigh,
} from "./results-fixtures";

// Test values (invented cars), judged by the real engine with the fixture's club rule.
const movedUp = verdictFor("b", wingHigh);
const held = verdictFor("c", overhangLong, overhangStops);
const decided = verdictFor("e", [
  ...wingHigh,
  override(9, { status: "cleared", classId: "club", reason: "Wing re-set at the tech line" }),
]);
// The wing was first read 9 in above the roof, that reading voided, and read again at 7 in.
const voidedOver = verdictFor("f", [
  ...wingHigh,
  voidRecord(6, 1, "read off the wrong roof point"),
  lengthReading(7, "wingTopFromGroundMm", 1300 + 7 * IN),
]);
// Two rules broken at once: wing 9 in above the roof and 6 in behind.
const twoOver = verdictFor("i", [...wingHigh.slice(0, 2), ...overhangLong.slice(2)]);
const at = (v: Verdict, computedAt: string): [string, StoredVerdict] => [
  v.entryId,
  { verdict: v, computedAt },
];
const report = shapeChiefReport({
  entries: [
    entry("b", 12),
    entry("c", 3),
    entry("e", 5),
    entry("f", 8),
    entry("g", 30),
    entry("h", 40),
    entry("i", 15),
  ],
  verdicts: new Map([
    at(movedUp, "2026-05-16T09:00:00.000Z"),
    at(held, "2026-05-16T09:30:00.000Z"),
    at(decided, "2026-05-16T10:15:00.000Z"),
    at(voidedOver, "2026-05-16T09:45:00.000Z"),
    at(twoOver, "2026-05-16T09:50:00.000Z"),
  ]),
  // "g" has records whose verdict is still being computed; "h" was never at the tech line.
  recordCounts: new Map([
    ["b", 5],
    ["c", 5],
    ["e", 6],
    ["f", 7],
    ["g", 1],
    ["i", 5],
  ]),
  classes: [
    { id: "club", name: "Club" },
    { id: "open", name: "Open" },
  ],
  officialNames: new Map([["chief-1", "Helen Marsh"]]),
  timeZone: "Europe/London",
});
const car = (n: number) => report.cars.find((c) => c.carNumber === n);

describe("shapeChiefReport: every car examined, with the reason for each rejection", () => {
  it("lists every car with at least one record, by car number, and no other", () => {
    // Source: Motorsport UK NCR 2026 Ch.5 Part A App.6 Art.3.1 — all cars examined are reported.
    expect(report.cars.map((c) => c.carNumber)).toEqual([3, 5, 8, 12, 15, 30]);
    expect(report.counts).toMatchObject({
      examined: 6,
      cleared: 2,
      "moved-up": 2,
      held: 1,
      waiting: 1,
    });
    expect(car(30)?.state).toBe("waiting");
    expect(car(30)?.rejections).toEqual([]);
  });

  it("gives each failed rule in words, with its class and its consequence", () => {
    // Source: NIST SP 811 App. B.8 — 9 in − 8 in = 1 in = 25.4 mm over the club rule's limit.
    expect(car(12)?.rejections).toEqual([
      { what: "Club class", why: expect.stringMatching(/over by 25\.4 mm — moves up to Open\.$/) },
    ]);
    expect(car(12)?.runsIn).toBe("Open");
    // 6 in − 5 in = 1 in behind the limit, and the rule set says that stops the car.
    expect(car(3)?.rejections).toEqual([
      {
        what: "Club class",
        why: expect.stringMatching(/over by 25\.4 mm — held: fix and re-present\.$/),
      },
    ]);
    expect(car(3)?.runsIn).toBeNull();
    // Two rules broken: two rejections, both in the declared class.
    expect(car(15)?.rejections.map((r) => r.what)).toEqual(["Club class", "Club class"]);
    expect(
      car(15)
        ?.rejections.map((r) => r.why)
        .join(" "),
    ).toMatch(/above the roof.*behind/);
  });

  it("shows the chief scrutineer's override with their reason beside what the records said", () => {
    const c = car(5);
    expect(c?.state).toBe("cleared");
    expect(c?.decision).toEqual({
      // Source: IANA tz database, Europe/London — BST (UTC+1) in May; the device said 09:09+01:00.
      by: "Helen Marsh at 09:09 on Sat 16 May",
      reason: "Wing re-set at the tech line",
      computed: movedUp.reason,
    });
    expect(c?.rejections.map((r) => r.what)).toEqual(["Club class"]);
    expect(report.counts.decidedByChief).toBe(1);
  });

  it("leaves voided readings out: a reading voided and taken again is no rejection", () => {
    expect(car(8)?.state).toBe("cleared");
    expect(car(8)?.rejections).toEqual([]);
  });

  it("is issued as of the latest verdict among the cars examined", () => {
    expect(report.issuedAt).toBe("2026-05-16T10:15:00.000Z");
  });
});

describe("chiefReportCsv", () => {
  const rows = parse(chiefReportCsv(report, "Europe/London"), {
    bom: true,
    columns: true,
  }) as Record<string, string>[];

  it("reads back one line per car examined, each rejection on its own line in one cell", () => {
    // Source: RFC 4180 §2 — a field holding a line break is quoted, and stays one field.
    expect(rows.map((r) => r.Car)).toEqual(["3", "5", "8", "12", "15", "30"]);
    expect(rows.map((r) => r.State)).toEqual([
      "Held",
      "Cleared",
      "Cleared",
      "Moved up",
      "Moved up",
      "Waiting",
    ]);
    expect(rows[4]?.["Reasons for rejection"]?.split("\n")).toEqual(
      twoOver.classChecks[0]?.rules
        .filter((r) => r.outcome === "fail")
        .map((r) => `Club class: ${r.reason}`),
    );
    expect(rows[4]?.["Reasons for rejection"]?.split("\n")).toHaveLength(2);
    expect(rows[3]?.["Reasons for rejection"]).toMatch(/^Club class: .*moves up to Open\.$/);
    expect(rows[2]?.["Reasons for rejection"]).toBe("");
    expect(rows[1]?.["Chief scrutineer's decision"]).toBe(
      `Helen Marsh at 09:09 on Sat 16 May: Wing re-set at the tech line (the records said: ${movedUp.reason})`,
    );
    expect(rows[0]?.["Verdict computed (Europe/London)"]).toBe("2026-05-16 10:30");
    expect(
      rows.every((r) => r.Report?.startsWith("Provisional, issued 11:15 on Sat 16 May 2026")),
    ).toBe(true);
  });
});
