import { describe, expect, it } from "vitest";
import type { TechRecord } from "@/lib/scrutineer/records/record-schema";
import { evaluateEntry } from "@/lib/scrutineer/verdicts/evaluate-entry";
import { chiefAttention } from "@/lib/tech/chief-attention";
import { needsChiefScrutineer } from "@/lib/tech/needs-chief-scrutineer";
import { byOfficial, clubRuleSet, input, lengthReading, override } from "../scrutineer/fixtures";

const IN = 25.4; // Source: NIST SP 811 App. B.8 — 1 in = 25.4 mm exactly

// A car inside the club rule, then a second scrutineer's overhang 4 mm off the first: with tape
// u = 1 mm each and k = 2 the readings may differ by 2.83 mm, so they disagree.
// Source: JCGM 100:2008 §5.1.2, §6.2.1 (combined and expanded uncertainty).
const disagreeing: TechRecord[] = [
  lengthReading(1, "wingTopFromGroundMm", 1300 + 7 * IN),
  lengthReading(2, "roofPeakFromGroundMm", 1300),
  lengthReading(3, "wingOverhangMm", 4 * IN),
  lengthReading(4, "wingSpanMm", 64 * IN),
  lengthReading(5, "bodyWidthMm", 64.5 * IN),
  byOfficial(lengthReading(6, "wingOverhangMm", 4 * IN + 4), "scrutineer-b"),
];
const run = (records: TechRecord[]) =>
  evaluateEntry(input({ ruleSet: clubRuleSet(), records, declaredClassId: "club" }));
const waitsFor = (v: ReturnType<typeof run>) => ({
  needsChief: needsChiefScrutineer(v),
  words: chiefAttention({ status: v.status, flags: v.flags, rejectedOverride: null }),
});

// Source: DOMAIN.md, Roles — the chief scrutineer has the final say at tech and resolves disputes.
describe("a standing override settles the car for the chief's queue", () => {
  it("a car whose readings disagree waits for the chief", () => {
    const v = run(disagreeing);
    expect(v.flags).toContain("disagreement");
    expect(waitsFor(v).needsChief).toBe(true);
    expect(waitsFor(v).words[0]).toMatch(/^Readings disagree/);
  });

  it("once the chief clears it in its class, nothing waits, though the readings still disagree", () => {
    const v = run([
      ...disagreeing,
      override(7, { status: "cleared", classId: "club", reason: "Re-measured by me" }),
    ]);
    expect(v.status).toBe("cleared");
    expect(v.flags).toEqual(expect.arrayContaining(["disagreement", "overridden"]));
    expect(waitsFor(v)).toEqual({ needsChief: false, words: [] });
  });

  it("an override that does not fit settles nothing: the car still waits", () => {
    // Cleared must name the declared class (lib/scrutineer/classes/override-target-problem.ts).
    const v = run([
      ...disagreeing,
      override(7, { status: "cleared", classId: "open", reason: "Entrant asked" }),
    ]);
    expect(v.flags).toContain("override-invalid");
    expect(v.flags).not.toContain("overridden");
    expect(waitsFor(v).needsChief).toBe(true);
    expect(waitsFor(v).words[0]).toMatch(/was not applied/);
  });
});
