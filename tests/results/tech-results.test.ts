import { parse } from "csv-parse/sync";
import { describe, expect, it } from "vitest";
import { describeIssueTime } from "@/lib/results/describe-issue-time";
import { shapeTechResults } from "@/lib/results/shape-tech-results";
import { techResultsCsv } from "@/lib/results/tech-results-csv";
import type { ResultsVerdict } from "@/lib/results/tech-results-input";
import type { Verdict } from "@/lib/scrutineer/verdicts/verdict-schema";
import {
  entry,
  inside,
  overhangLong,
  overhangStops,
  override,
  verdictFor,
  wingHigh,
} from "./results-fixtures";

const classes = [
  { id: "club", name: "Club" },
  { id: "open", name: "Open" },
];
const short = (v: Verdict, computedAt: string): ResultsVerdict => ({
  entryId: v.entryId,
  status: v.status,
  classId: v.classId,
  reason: v.reason,
  override: v.override && { officialId: v.override.officialId, deviceTime: v.override.deviceTime },
  computedAt,
});

// Test values (invented cars), judged by the real engine with the fixture's club rule.
const cleared = verdictFor("a", inside);
const movedUp = verdictFor("b", wingHigh);
const held = verdictFor("c", overhangLong, overhangStops);
const decided = verdictFor("e", [
  ...wingHigh,
  override(9, { status: "cleared", classId: "club", reason: "Wing re-set at the tech line" }),
]);
const entries = [
  entry("b", 12),
  entry("a", 7, '=HYPERLINK("http://x.test")'),
  entry("c", 3),
  entry("d", 21),
  entry("e", 5),
];
const results = shapeTechResults({
  entries,
  verdicts: [
    short(cleared, "2026-05-16T08:10:00.000Z"),
    short(movedUp, "2026-05-16T13:32:00.000Z"),
    short(held, "2026-05-16T09:00:00.000Z"),
    short(decided, "2026-05-16T10:00:00.000Z"),
    // A withdrawn car's verdict: not listed, and not the time of issue.
    short({ ...cleared, entryId: "gone" }, "2026-05-16T15:00:00.000Z"),
  ],
  classes,
  officialNames: new Map([["chief-1", "Helen Marsh"]]),
  timeZone: "Europe/London",
});

describe("shapeTechResults", () => {
  it("puts each car that runs in the class it runs in, on the ladder's order, by car number", () => {
    expect(results.classes.map((c) => [c.className, c.cars.map((car) => car.carNumber)])).toEqual([
      ["Club", [5, 7]],
      ["Open", [12]],
    ]);
    expect(results.counts).toEqual({
      total: 5,
      cleared: 2,
      "moved-up": 1,
      held: 1,
      waiting: 1,
      "re-measure": 0,
    });
  });

  it("says who moved up and why, in the rule's numbers", () => {
    expect(results.movedUp.map((c) => [c.carNumber, c.declaredClass, c.runsIn])).toEqual([
      [12, "Club", "Open"],
    ]);
    // Source: NIST SP 811 App. B.8 — 9 in − 8 in = 1 in = 25.4 mm over the club rule's limit
    expect(results.movedUp[0]?.reason).toContain("over by 25.4 mm");
    expect(results.movedUp[0]?.reason).toMatch(/^Moves up from Club to Open/);
  });

  it("lists held and undecided cars apart, with why, and never in a class", () => {
    expect(results.held.map((c) => [c.carNumber, c.runsIn])).toEqual([[3, null]]);
    // Source: NIST SP 811 App. B.8 — 6 in − 5 in = 1 in = 25.4 mm behind the limit
    expect(results.held[0]?.reason).toContain("over by 25.4 mm");
    expect(results.held[0]?.reason).toMatch(/^Held/);
    expect(results.notYet.map((c) => [c.carNumber, c.state, c.reason])).toEqual([
      [21, "waiting", "Waiting — no verdict yet."],
    ]);
  });

  it("names the chief scrutineer's decision with who and when, in the event's zone", () => {
    const car5 = results.classes[0]?.cars.find((c) => c.carNumber === 5);
    expect(car5?.state).toBe("cleared");
    // The override's device time is 09:09 at +01:00; Europe/London is on BST (UTC+1) in May.
    // Source: IANA tz database, Europe/London — BST from the last Sunday in March.
    expect(car5?.decidedBy).toBe("Helen Marsh at 09:09 on Sat 16 May");
    expect(car5?.reason).toMatch(/^Chief scrutineer's decision: cleared in Club — Wing re-set/);
  });

  it("is issued as of the latest verdict of a listed car", () => {
    expect(results.issuedAt).toBe("2026-05-16T13:32:00.000Z");
  });
});

describe("describeIssueTime", () => {
  it("gives the venue's wall-clock time either side of the clocks changing", () => {
    // Source: IANA tz database, Europe/London — GMT (UTC+0) in winter, BST (UTC+1) from
    // 01:00 UTC on the last Sunday in March (29 March 2026).
    expect(describeIssueTime("2026-03-29T00:59:00Z", "Europe/London")).toBe(
      "00:59 on Sun 29 Mar 2026 (Europe/London time)",
    );
    expect(describeIssueTime("2026-03-29T01:00:00Z", "Europe/London")).toBe(
      "02:00 on Sun 29 Mar 2026 (Europe/London time)",
    );
    // Source: IANA tz database, America/New_York — EDT (UTC−4) in May.
    expect(describeIssueTime("2026-05-16T13:32:00Z", "America/New_York")).toBe(
      "09:32 on Sat 16 May 2026 (America/New_York time)",
    );
    expect(describeIssueTime(null, "Europe/London")).toBe("no verdict computed yet");
  });
});

describe("techResultsCsv", () => {
  const csv = techResultsCsv(results, "Europe/London");
  const rows = parse(csv, { bom: true, columns: true }) as Record<string, string>[];

  it("reads back as one line per car, by car number, with the state and why", () => {
    // Source: RFC 4180 §2 — records end in CRLF; the header names each field.
    expect(csv.charCodeAt(0)).toBe(0xfeff); // Source: Unicode 15 §23.8 — U+FEFF byte order mark
    expect(csv).toContain("\r\n");
    expect(rows.map((r) => r.Car)).toEqual(["3", "5", "7", "12", "21"]);
    expect(rows.map((r) => r.State)).toEqual(["Held", "Cleared", "Cleared", "Moved up", "Waiting"]);
    expect(rows.map((r) => r["Runs in class"])).toEqual(["", "Club", "Club", "Open", ""]);
    expect(rows[3]?.Why).toBe(movedUp.reason);
    expect(rows[1]?.["Decided by the chief scrutineer"]).toBe("Helen Marsh at 09:09 on Sat 16 May");
  });

  it("gives local times and says on every line that the results are provisional", () => {
    // Source: IANA tz database, Europe/London — BST (UTC+1) in May: 13:32 UTC is 14:32.
    expect(rows[3]?.["Verdict computed (Europe/London)"]).toBe("2026-05-16 14:32");
    for (const r of rows) {
      expect(r.Results).toBe("Provisional, issued 14:32 on Sat 16 May 2026 (Europe/London time)");
    }
  });

  it("defuses a name a spreadsheet would run as a formula", () => {
    // Source: OWASP, CSV Injection — prefix cells starting with = + - @ with an apostrophe.
    expect(rows[2]?.["Driver(s)"]).toBe('\'=HYPERLINK("http://x.test")');
  });
});
