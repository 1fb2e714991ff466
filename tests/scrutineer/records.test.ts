import { describe, expect, it } from "vitest";
import type { TechRecord } from "@/lib/scrutineer/records/record-schema";
import type { RuleSetInput } from "@/lib/scrutineer/rule-sets/rule-set-schema";
import { evaluateEntry } from "@/lib/scrutineer/verdicts/evaluate-entry";
import { evaluateEntryInputSchema } from "@/lib/scrutineer/verdicts/evaluate-entry-input-schema";
import { verdictSchema } from "@/lib/scrutineer/verdicts/verdict-schema";
import {
  byOfficial,
  clubRuleSet,
  input,
  lengthReading,
  override,
  reading,
  uuid7,
  voidRecord,
} from "./fixtures";

const IN = 25.4; // Source: NIST SP 811 App. B.8 — 1 in = 25.4 mm exactly

/** A car inside the club rule (5 in behind, 8 in above the roof, span ≤ body). Source: common practice (no source). */
const inside: TechRecord[] = [
  lengthReading(1, "wingTopFromGroundMm", 1300 + 7 * IN),
  lengthReading(2, "roofPeakFromGroundMm", 1300),
  lengthReading(3, "wingOverhangMm", 4 * IN),
  lengthReading(4, "wingSpanMm", 64 * IN),
  lengthReading(5, "bodyWidthMm", 64.5 * IN),
];
const run = (records: TechRecord[], ruleSet: RuleSetInput = clubRuleSet()) =>
  evaluateEntry(input({ ruleSet, records, declaredClassId: "club" }));

describe("evaluateEntry: records", () => {
  it("a void removes its target; voiding the void restores it", () => {
    const wrong = byOfficial(lengthReading(6, "wingOverhangMm", 300), "scrutineer-b");
    expect(run([...inside, wrong]).status).toBe("re-measure");
    const voided = run([...inside, wrong, voidRecord(7, 6, "read the wrong car")]);
    expect(voided.status).toBe("cleared");
    expect(voided.records).toEqual({ total: 7, used: 6, voided: 1, ignored: 0 });
    expect(
      run([...inside, wrong, voidRecord(7, 6), voidRecord(8, 7, "the reading was right")]).status,
    ).toBe("re-measure");
  });

  it("ignores voids that void each other, and says so", () => {
    const v = run([...inside, voidRecord(7, 8), voidRecord(8, 7), voidRecord(9, 1)]);
    expect(v.flags).toContain("void-cycle");
    expect(v.status).toBe("waiting"); // the wing-top reading (1) is void; the cycle changes nothing
  });

  it("counts a record sent twice once, and ignores other entries' records", () => {
    const first = inside[0];
    if (first === undefined) throw new Error("fixture");
    const foreign = { ...lengthReading(20, "wingOverhangMm", 900), entryId: "entry-2" };
    const v = run([...inside, first, foreign]);
    expect(v.status).toBe("cleared");
    expect(v.records).toEqual({ total: 7, used: 5, voided: 0, ignored: 2 });
    expect(v.flags).toEqual(["foreign-record"]);
  });

  it("sets aside readings taken outside the rule's measurement conditions", () => {
    const aboard = reading(6, {
      dimension: "wingOverhangMm",
      value: 300,
      instrument: { id: "tape-1", name: "Steel tape", standardUncertainty: 1 },
      conditions: { driverAboard: true },
    });
    const v = run([...inside, aboard]);
    expect(v.status).toBe("cleared");
    expect(v.flags).toContain("conditions-mismatch");
    expect(v.setAside).toEqual([
      {
        recordId: uuid7(6),
        dimension: "wingOverhangMm",
        corner: null,
        why: "taken with the driver aboard",
      },
    ]);
  });

  it("the chief scrutineer's override sets the final word, shows who, and keeps the computed verdict", () => {
    const over = [
      ...inside.slice(0, 2),
      lengthReading(3, "wingOverhangMm", 5.25 * IN),
      ...inside.slice(3),
    ];
    const v = run([
      ...over,
      override(9, {
        status: "cleared",
        classId: "club",
        reason: "Plumb bob hung off the diffuser; re-read by me at 4.9 in",
      }),
    ]);
    expect(v.status).toBe("cleared");
    expect(v.classId).toBe("club");
    expect(v.flags).toContain("overridden");
    expect(v.override).toMatchObject({
      officialId: "chief-1",
      computedStatus: "moved-up",
      computedClassId: "open",
    });
    expect(v.reason).toBe(
      "Chief scrutineer's decision: cleared in Club — Plumb bob hung off the diffuser; re-read by me at 4.9 in.",
    );
    expect(v.reason).not.toContain("chief-1"); // who decided is kept in override.officialId, not in the words
    const undone = run([
      ...over,
      override(9, { status: "cleared", classId: "club", reason: "Plumb bob slipped" }),
      voidRecord(10, 9, "re-measured"),
    ]);
    expect(undone.status).toBe("moved-up");
    expect(undone.override).toBeNull();
  });

  it("a disagreement stays until the wrong reading is voided, as its reason says", () => {
    // Worked here: tape u 1 mm each, k 2 → allowed 2.83 mm (JCGM 100:2008 §5.1.2, §6.2.1); 10 mm apart.
    const other = byOfficial(lengthReading(6, "wingSpanMm", 64 * IN + 10), "scrutineer-b");
    const flagged = run([...inside, other]);
    expect(flagged.status).toBe("re-measure");
    expect(flagged.reason).toMatch(
      /re-measure to find which is right, then the chief scrutineer voids the wrong one\.$/,
    );
    // More readings agreeing with the first scrutineer do not clear it: the second one's value stands.
    const more = run([
      ...inside,
      other,
      lengthReading(7, "wingSpanMm", 64 * IN),
      lengthReading(8, "wingSpanMm", 64 * IN),
    ]);
    expect(more.flags).toContain("disagreement");
    const resolved = run([...inside, other, voidRecord(9, 6, "read the wrong plumb mark")]);
    expect(resolved.flags).not.toContain("disagreement");
    expect(resolved.status).toBe("cleared");
  });

  it("ignores an override naming no real class, and flags it", () => {
    const v = run([
      ...inside,
      override(9, { status: "moved-up", classId: "club", reason: "moving up as asked by entrant" }),
    ]);
    expect(v.status).toBe("cleared");
    expect(v.flags).toContain("override-invalid");
  });

  it("returns plain JSON that its own schema accepts, unchanged by a round trip", () => {
    const second = byOfficial(lengthReading(6, "wingOverhangMm", 4 * IN + 4), "scrutineer-b");
    const v = run([...inside, second]);
    expect(v.flags).toContain("disagreement");
    const json = JSON.parse(JSON.stringify(v));
    expect(json).toEqual(v);
    expect(verdictSchema.parse(json)).toEqual(v);
  });

  it("rejects an entry whose declared class is not in the rule set, at the input schema", () => {
    const r = evaluateEntryInputSchema.safeParse({
      ruleSet: clubRuleSet(),
      entry: { entryId: "e", declaredClassId: "gt1", declarations: {} },
      records: [],
      eventDate: "2026-05-16",
    });
    expect(r.success).toBe(false);
    expect(r.error?.issues[0]?.path).toEqual(["entry", "declaredClassId"]);
  });
});
