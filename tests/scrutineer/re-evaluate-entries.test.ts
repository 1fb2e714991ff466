import { describe, expect, it } from "vitest";
import type { TechRecord } from "@/lib/scrutineer/records/record-schema";
import { diffRuleSets } from "@/lib/scrutineer/rule-sets/diff-rule-sets";
import { type RuleSetInput, ruleSetSchema } from "@/lib/scrutineer/rule-sets/rule-set-schema";
import { evaluateEntryInputSchema } from "@/lib/scrutineer/verdicts/evaluate-entry-input-schema";
import { reEvaluateEntries } from "@/lib/scrutineer/verdicts/re-evaluate-entries";
import { clubRuleSet, lengthReading } from "./fixtures";

const IN = 25.4; // Source: NIST SP 811 App. B.8 — 1 in = 25.4 mm exactly

function entry(entryId: string, aboveRoofMm: number) {
  const records: TechRecord[] = [
    lengthReading(1, "wingTopFromGroundMm", 1300 + aboveRoofMm),
    lengthReading(2, "roofPeakFromGroundMm", 1300),
    lengthReading(3, "wingOverhangMm", 4 * IN),
    lengthReading(4, "wingSpanMm", 64 * IN),
    lengthReading(5, "bodyWidthMm", 64.5 * IN),
  ].map((r) => ({ ...r, entryId }));
  const { ruleSet: _unused, ...rest } = evaluateEntryInputSchema.parse({
    ruleSet: clubRuleSet(),
    entry: { entryId, declaredClassId: "club", declarations: { aero: { wing: true } } },
    records,
    eventDate: "2026-05-16",
    display: { length: "mm" },
  });
  return rest;
}

describe("reEvaluateEntries", () => {
  // v1: 8 in above the roof — Source: common practice (no source) — the club rule;
  // v2: 200 mm above the roof — Source: Motorsport UK NCR 2026 Ch.14 App.4, p.552
  const v1 = ruleSetSchema.parse(clubRuleSet());
  const v2Input: RuleSetInput = clubRuleSet();
  v2Input.version = 2;
  const first = v2Input.classes[0];
  if (first?.aero.wing.allowed) first.aero.wing.height = { reference: "roof-peak", maxMm: 200 };
  const v2 = ruleSetSchema.parse(v2Input);

  it("lists exactly the verdicts that change, with the rule that moved", () => {
    const r = reEvaluateEntries({
      before: v1,
      after: v2,
      entries: [entry("a", 150), entry("b", 202), entry("c", 210)],
    });
    expect(r.fromVersion).toBe(1);
    expect(r.toVersion).toBe(2);
    expect(r.unchangedCount).toBe(2); // 150 mm clears under both; 210 mm moves up under both
    expect(r.changed).toHaveLength(1);
    expect(r.changed[0]).toMatchObject({
      entryId: "b",
      before: { status: "cleared", classId: "club" },
      after: { status: "moved-up", classId: "open" },
    });
    expect(r.changed[0]?.why).toEqual(["Club wing height: limit 203.2 mm → 200 mm; pass → fail"]);
    expect(r.ruleSetChanges).toEqual([
      { path: "classes[club].aero.wing.height.maxMm", before: 203.2, after: 200 },
    ]);
  });

  it("lists a rule as new only where the rule set gained it, not for a class the car newly reaches", () => {
    // Open gets a height limit in both versions, so its rules are checked once the car moves up.
    // Source: Motorsport UK NCR 2026 Ch.14 App.4 — 200 mm above the roof (as v2's Club limit above)
    const withOpenLimit = (rs: RuleSetInput): RuleSetInput => {
      const open = rs.classes[1];
      if (open?.aero.wing.allowed) open.aero.wing.height = { reference: "roof-peak", maxMm: 300 };
      return rs;
    };
    const before = ruleSetSchema.parse(withOpenLimit(clubRuleSet()));
    const after = ruleSetSchema.parse(withOpenLimit(structuredClone(v2Input)));
    const moved = reEvaluateEntries({ before, after, entries: [entry("b", 202)] });
    expect(moved.changed[0]?.after).toMatchObject({ status: "moved-up", classId: "open" });
    // Open was checked under v2 only: its rules are not "new rules".
    expect(moved.changed[0]?.why).toEqual([
      "Club wing height: limit 203.2 mm → 200 mm; pass → fail",
    ]);

    // A treadwear floor added to Club, checked under both versions, is a new rule.
    // Source: common practice (no source) — UTQG treadwear floors in club classes
    const floored = withOpenLimit(clubRuleSet());
    floored.version = 5;
    const club = floored.classes[0];
    if (club !== undefined) club.minTreadwear = 200;
    const treadwearEntry = { ...entry("t", 150) };
    treadwearEntry.entry = {
      ...treadwearEntry.entry,
      declarations: {
        ...treadwearEntry.entry.declarations,
        tyres: { kind: "graded", treadwear: 180 },
      },
    };
    const gained = reEvaluateEntries({
      before,
      after: ruleSetSchema.parse(floored),
      entries: [treadwearEntry],
    });
    expect(gained.changed[0]?.why).toEqual(["Club tyre treadwear: new rule, fail"]);
  });

  it("reports entries that cannot be evaluated under the new version", () => {
    const v3Input = clubRuleSet();
    v3Input.version = 3;
    v3Input.classes = v3Input.classes.filter((c) => c.id !== "club");
    const r = reEvaluateEntries({
      before: v1,
      after: ruleSetSchema.parse(v3Input),
      entries: [entry("a", 150)],
    });
    expect(r.problems).toEqual([
      { entryId: "a", message: 'Class "club" is not in rule set club-rule v3' },
    ]);
  });

  it("diffs rule sets by class id, not by position", () => {
    const swapped = clubRuleSet();
    swapped.version = 4;
    swapped.classes = [...swapped.classes].reverse();
    const changes = diffRuleSets(v1, ruleSetSchema.parse(swapped));
    expect(changes).toEqual([{ path: "classes(order)", before: "club,open", after: "open,club" }]);
  });
});
