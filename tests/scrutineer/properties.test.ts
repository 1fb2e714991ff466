import fc from "fast-check";
import { describe, expect, it } from "vitest";
import type { TechRecord } from "@/lib/scrutineer/records/record-schema";
import type { RuleSetInput } from "@/lib/scrutineer/rule-sets/rule-set-schema";
import { evaluateEntry } from "@/lib/scrutineer/verdicts/evaluate-entry";
import type { Verdict } from "@/lib/scrutineer/verdicts/verdict-schema";
import {
  checklist,
  clubRuleSet,
  input,
  lengthReading,
  override,
  spread,
  uuid7,
  voidRecord,
} from "./fixtures";

/** Lower is better: cleared/moved up in class c → 2c; re-measure while settling class c → 2c + 1; held → worst. */
function rank(v: Verdict, classIds: string[]): number {
  if (v.status === "held") return 1000;
  const c = classIds.indexOf(v.classId ?? "");
  if (v.status === "cleared" || v.status === "moved-up") return 2 * c;
  if (v.status === "re-measure") return 2 * c + 1;
  return 500; // waiting cannot happen here: every reading is present
}

function ladder(
  overhangLimitsMm: number[],
  decisionRule: RuleSetInput["decisionRule"],
): RuleSetInput {
  const base = clubRuleSet(decisionRule);
  return {
    ...base,
    classes: overhangLimitsMm.map((limit, i) => ({
      id: `c${i}`,
      name: `Class ${i}`,
      aero: {
        wing: {
          allowed: true,
          height: { reference: "roof-peak", maxMm: 200 },
          maxOverhangMm: limit,
          span: null,
          maxChordMm: null,
        },
        splitter: { allowed: true, maxProtrusionMm: null, width: null },
      },
    })),
  };
}

describe("properties of the verdict", () => {
  it("a larger overhang never improves a verdict", () => {
    fc.assert(
      fc.property(
        fc.array(fc.integer({ min: 0, max: 300 }), { minLength: 1, maxLength: 4 }),
        fc.oneof(
          fc.constant<RuleSetInput["decisionRule"]>({ kind: "simple" }),
          fc.constant<RuleSetInput["decisionRule"]>({ kind: "guarded", k: 2 }),
        ),
        fc.array(spread(-50, 350), { minLength: 1, maxLength: 3 }),
        spread(0, 100),
        spread(0.2, 5),
        (limits, decisionRule, overhangsMm, extraMm, u) => {
          const rs = ladder(limits, decisionRule);
          const ids = limits.map((_, i) => `c${i}`);
          const car = (shift: number): TechRecord[] => [
            lengthReading(1, "wingTopFromGroundMm", 1400),
            lengthReading(2, "roofPeakFromGroundMm", 1300),
            ...overhangsMm.map((o, i) => lengthReading(10 + i, "wingOverhangMm", o + shift, u)),
          ];
          const judge = (shift: number) =>
            evaluateEntry(input({ ruleSet: rs, records: car(shift), declaredClassId: "c0" }));
          expect(rank(judge(extraMm), ids)).toBeGreaterThanOrEqual(rank(judge(0), ids));
        },
      ),
      { numRuns: 300 },
    );
  });

  it("the order of records never changes the verdict", () => {
    const rs: RuleSetInput = {
      ...clubRuleSet({ kind: "guarded", k: 2 }),
      safety: {
        standards: [],
        checklist: [
          { id: "battery", label: "Battery secured" },
          { id: "kill-switch", label: "Kill switch" },
        ],
      },
    };
    const recordArb = fc
      .record({
        overhangs: fc.array(spread(90, 140), {
          minLength: 1,
          maxLength: 4,
        }),
        spans: fc.array(spread(1620, 1650), {
          minLength: 0,
          maxLength: 3,
        }),
        answers: fc.array(
          fc.record({
            item: fc.constantFrom("battery", "kill-switch"),
            pass: fc.boolean(),
            minute: fc.integer({ min: 0, max: 5 }),
          }),
          { maxLength: 5 },
        ),
        voids: fc.array(fc.integer({ min: 1, max: 30 }), { maxLength: 4 }),
        chief: fc.option(fc.constantFrom("cleared", "held"), { nil: undefined }),
        duplicate: fc.boolean(),
      })
      .map((g) => {
        let n = 1;
        const records: TechRecord[] = [
          lengthReading(n++, "wingTopFromGroundMm", 1450),
          lengthReading(n++, "roofPeakFromGroundMm", 1300),
          lengthReading(n++, "bodyWidthMm", 1638.3),
          ...g.overhangs.map((o) => lengthReading(n++, "wingOverhangMm", o)),
          ...g.spans.map((s) => lengthReading(n++, "wingSpanMm", s)),
          ...g.answers.map((a) =>
            checklist(n++, { itemId: a.item, result: a.pass ? "pass" : "fail" }, a.minute),
          ),
        ];
        for (const target of g.voids) records.push(voidRecord(n++, target));
        if (g.chief === "cleared")
          records.push(
            override(n++, {
              status: "cleared",
              classId: "club",
              reason: "chief's call on the day",
            }),
          );
        if (g.chief === "held")
          records.push(
            override(n++, { status: "held", classId: null, reason: "chief's call on the day" }),
          );
        const first = records[0];
        if (g.duplicate && first !== undefined)
          records.push({ ...first }, { ...first, deviceId: "phone-2" });
        return records;
      });
    fc.assert(
      fc.property(
        recordArb.chain((records) =>
          fc.tuple(
            fc.constant(records),
            fc.shuffledSubarray(records, { minLength: records.length, maxLength: records.length }),
          ),
        ),
        ([records, shuffled]) => {
          const a = evaluateEntry(input({ ruleSet: rs, records, declaredClassId: "club" }));
          const b = evaluateEntry(
            input({ ruleSet: rs, records: shuffled, declaredClassId: "club" }),
          );
          expect(b).toEqual(a);
        },
      ),
      { numRuns: 300 },
    );
  });

  it("device time, not list position, decides which checklist answer is the latest", () => {
    // Keeps the property above honest: the records' content does decide the verdict.
    const rs: RuleSetInput = {
      ...clubRuleSet(),
      safety: { standards: [], checklist: [{ id: "battery", label: "Battery secured" }] },
    };
    const base = [
      lengthReading(1, "wingTopFromGroundMm", 1450),
      lengthReading(2, "roofPeakFromGroundMm", 1300),
      lengthReading(3, "wingOverhangMm", 100),
      lengthReading(6, "wingSpanMm", 1600),
      lengthReading(7, "bodyWidthMm", 1650),
    ];
    const failThenPass = [
      ...base,
      checklist(4, { itemId: "battery", result: "fail" }, 1),
      checklist(5, { itemId: "battery", result: "pass" }, 2),
    ];
    const passThenFail = [
      ...base,
      checklist(4, { itemId: "battery", result: "fail" }, 2),
      checklist(5, { itemId: "battery", result: "pass" }, 1),
    ];
    expect(
      evaluateEntry(input({ ruleSet: rs, records: failThenPass, declaredClassId: "club" })).status,
    ).toBe("cleared");
    expect(
      evaluateEntry(input({ ruleSet: rs, records: passThenFail, declaredClassId: "club" })).status,
    ).toBe("held");
    expect(uuid7(4) < uuid7(5)).toBe(true);
  });
});
