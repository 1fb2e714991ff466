import { describe, expect, it } from "vitest";
import type { TechRecord } from "@/lib/scrutineer/records/record-schema";
import type { RuleSetInput } from "@/lib/scrutineer/rule-sets/rule-set-schema";
import { evaluateEntry } from "@/lib/scrutineer/verdicts/evaluate-entry";
import { VERDICT_NOTICE } from "@/lib/scrutineer/verdicts/verdict-notice";
import {
  byOfficial,
  clubRuleSet,
  input,
  lengthReading,
  note,
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

describe("evaluateEntry: statuses", () => {
  it("waits when nothing is measured, naming what is needed", () => {
    const v = run([note(1, "car in the queue")]);
    expect(v.status).toBe("waiting");
    expect(v.missing).toEqual([
      "wing top height from the ground",
      "roof peak height from the ground",
      "wing overhang",
      "wing span",
      "body width",
    ]);
    expect(v.reason).toMatch(/^Waiting — still to do: wing top height from the ground, /);
  });

  it("a car never seen at the tech line waits, whatever its declarations say", () => {
    // Source: Motorsport UK NCR 2026 Ch.5 Part A App.6 Arts 2.14–2.16 — a scrutineer examines the car before approval
    const noLimits = clubRuleSet();
    noLimits.classes = noLimits.classes.slice(1); // "Open": nothing to measure
    const v = evaluateEntry(
      input({ ruleSet: noLimits, records: [], declaredClassId: "open", declarations: {} }),
    );
    expect(v.status).toBe("waiting");
    expect(v.classId).toBe("open");
    expect(v.reason).toBe("Waiting — not yet seen at the tech line.");
    // A voided record does not count as being seen; one effective record does.
    const voided = evaluateEntry(
      input({
        ruleSet: noLimits,
        records: [note(1), voidRecord(2, 1, "wrong car's note")],
        declaredClassId: "open",
        declarations: {},
      }),
    );
    expect(voided.reason).toBe("Waiting — not yet seen at the tech line.");
    const seen = evaluateEntry(
      input({ ruleSet: noLimits, records: [note(1)], declaredClassId: "open", declarations: {} }),
    );
    expect(seen.status).toBe("cleared");
  });

  it("one scrutineer's repeated readings are combined, not flagged as a disagreement", () => {
    // Source: ARCHITECTURE.md — disagreement is two scrutineers' readings beyond their combined
    // uncertainty; JCGM 100:2008 §4.2 — repeated observations give a Type A uncertainty.
    // 1400, 1402, 1401 mm on a u = 0.5 mm gauge: mean 1401 mm.
    const repeats = [1400, 1402, 1401].map((mm, i) =>
      lengthReading(20 + i, "wingTopFromGroundMm", mm, 0.5),
    );
    const v = run([...repeats, ...inside.slice(1)]);
    expect(v.flags).not.toContain("disagreement");
    expect(v.status).toBe("cleared");
    expect(v.dimensions.find((d) => d.dimension === "wingTopFromGroundMm")?.mean).toBeCloseTo(
      1401,
      12,
    );
  });

  it("clears a car inside every limit and says which check was closest", () => {
    const v = run(inside);
    expect(v.status).toBe("cleared");
    expect(v.classId).toBe("club");
    expect(v.reason).toBe(
      "Cleared in Club — all checks passed; closest: wing span, 12.7 mm inside.",
    );
    expect(v.notice).toBe(VERDICT_NOTICE);
    expect(v.notice).toMatch(/chief scrutineer has the final say/);
  });

  it("asks for a re-measure when two scrutineers' readings of one dimension disagree", () => {
    // Worked here: tape u 1 mm each, k 2 → allowed 2.83 mm; 4 mm apart disagrees (JCGM 100:2008 §5.1.2, §6.2.1)
    const second = byOfficial(lengthReading(6, "wingOverhangMm", 4 * IN + 4), "scrutineer-b");
    const v = run([...inside, second]);
    expect(v.status).toBe("re-measure");
    expect(v.flags).toContain("disagreement");
    expect(v.reason).toBe(
      "Re-measure — two scrutineers' readings of the wing overhang differ: 101.6 mm and 105.6 mm, more than the 2.8 mm their uncertainties allow; re-measure to find which is right, then the chief scrutineer voids the wrong one.",
    );
    const d = v.dimensions.find((x) => x.dimension === "wingOverhangMm");
    expect(d?.n).toBe(2);
    expect(d?.disagreements[0]).toMatchObject({
      first: { officialId: "scrutineer-a", recordIds: [uuid7(3)], n: 1 },
      second: { officialId: "scrutineer-b", recordIds: [uuid7(6)], n: 1 },
      difference: 4,
    });
  });

  it("words a disagreement finely enough to show the difference, and says where the car stands as read", () => {
    // Worked here: u 0.5 mm each, k 2 → allowed 2·√0.5 = 1.414 mm = 0.0557 in; 1.5 mm = 0.0591 in apart;
    // 1528.6 mm = 60.181 in and 1530.1 mm = 60.240 in (NIST SP 811 App. B.8 — 1 in = 25.4 mm)
    const over = [
      lengthReading(1, "wingTopFromGroundMm", 1300 + 9 * IN, 0.5),
      byOfficial(lengthReading(6, "wingTopFromGroundMm", 1300 + 9 * IN + 1.5, 0.5), "scrutineer-b"),
    ];
    const v = evaluateEntry(
      input({
        ruleSet: clubRuleSet(),
        records: [...over, ...inside.slice(1)],
        declaredClassId: "club",
        length: "in",
      }),
    );
    expect(v.status).toBe("re-measure");
    expect(v.classId).toBe("open");
    expect(v.reason).toBe(
      "Re-measure — two scrutineers' readings of the wing top height from the ground differ: 60.181 in and 60.24 in, more than the 0.056 in their uncertainties allow; as read, the car moves up to Open; re-measure to find which is right, then the chief scrutineer voids the wrong one.",
    );
  });

  it("holds a car over every class's limits", () => {
    const capped = clubRuleSet();
    const top = capped.classes[1];
    if (top === undefined) throw new Error("fixture has two classes");
    top.aero.wing = {
      allowed: true,
      height: { reference: "roof-peak", maxMm: 300 },
      maxOverhangMm: null,
      span: null,
      maxChordMm: null,
    };
    const v = run(
      [
        lengthReading(1, "wingTopFromGroundMm", 1650),
        lengthReading(2, "roofPeakFromGroundMm", 1300),
        ...inside.slice(2),
      ],
      capped,
    );
    expect(v.status).toBe("held");
    expect(v.reason).toBe(
      "Held — over every class's limits; in Open: wing top 350 mm above the roof; limit 300 mm; over by 50 mm.",
    );
    expect(v.classChecks.map((c) => c.fit)).toEqual(["over", "over"]);
    expect(v.classChecks[1]?.rules[0]?.reason).toMatch(
      /— over every class's limits: held, fix and re-present\.$/,
    );
  });

  it("holds, not moves up, when the rule set says a violation stops the car", () => {
    const rs: RuleSetInput = { ...clubRuleSet(), onViolation: { "wing-overhang": "stop" } };
    const v = run(
      [...inside.slice(0, 2), lengthReading(3, "wingOverhangMm", 6 * IN), ...inside.slice(3)],
      rs,
    );
    expect(v.status).toBe("held");
    expect(v.reason).toBe(
      "Held — fix and re-present: wing 152.4 mm behind the rearmost bodywork; limit 127 mm behind; over by 25.4 mm.",
    );
  });

  it("a tyre without a treadwear grade fails a floor and moves up", () => {
    // Source: common practice (no source) — a race tyre without UTQG fails any floor
    const rs = clubRuleSet();
    const first = rs.classes[0];
    if (first === undefined) throw new Error("fixture has a first class");
    first.minTreadwear = 200;
    const v = evaluateEntry(
      input({
        ruleSet: rs,
        records: inside,
        declaredClassId: "club",
        declarations: { aero: { wing: true }, tyres: { kind: "no-grade" } },
      }),
    );
    expect(v.status).toBe("moved-up");
    expect(v.reason).toBe(
      "Moves up from Club to Open — tyres carry no treadwear grade; Club needs a treadwear grade of at least 200.",
    );
    const graded = evaluateEntry(
      input({
        ruleSet: rs,
        records: inside,
        declaredClassId: "club",
        declarations: { aero: { wing: true }, tyres: { kind: "graded", treadwear: 200 } },
      }),
    );
    expect(graded.status).toBe("cleared");
  });

  it("words an ungraded tyre on a zero treadwear floor sensibly", () => {
    // Source: common practice (no source) — a race tyre without UTQG fails any floor, a floor of 0 included
    const rs = clubRuleSet();
    const first = rs.classes[0];
    if (first === undefined) throw new Error("fixture has a first class");
    first.minTreadwear = 0;
    const v = evaluateEntry(
      input({
        ruleSet: rs,
        records: inside,
        declaredClassId: "club",
        declarations: { aero: { wing: true }, tyres: { kind: "no-grade" } },
      }),
    );
    expect(v.reason).toBe(
      "Moves up from Club to Open — tyres carry no treadwear grade; Club needs tyres with a treadwear grade.",
    );
  });

  it("holds a car over the event's noise limit", () => {
    // Source: Motorsport UK NCR 2026 Ch.7 App.8; club noise-test pages — club limits around 105 dB(A)
    const rs: RuleSetInput = {
      ...clubRuleSet(),
      noise: { maxDbA: 105, method: "0.5 m from the outlet at 45°, ¾ of max engine speed" },
    };
    const meter = { id: "meter-1", name: "Sound level meter", standardUncertainty: 0.5 };
    const v = run(
      [...inside, reading(9, { dimension: "noiseDbA", value: 108, instrument: meter })],
      rs,
    );
    expect(v.status).toBe("held");
    expect(v.reason).toBe(
      "Held — fix and re-present: noise 108 dB(A); limit 105 dB(A); over by 3 dB(A).",
    );
  });

  it("words every reason in the event's unit", () => {
    const v = evaluateEntry(
      input({ ruleSet: clubRuleSet(), records: inside, declaredClassId: "club", length: "in" }),
    );
    expect(v.classChecks[0]?.rules.map((r) => r.reason)).toEqual([
      "Wing top 7 in above the roof; limit 8 in; 1 in inside.",
      "Wing 4 in behind the rearmost bodywork; limit 5 in behind; 1 in inside.",
      "Wing span 64 in, end plates counted, on a body 64.5 in wide; limit the body's width; 0.5 in inside.",
    ]);
    expect(v.display).toEqual({ length: "in", mass: "lb" });
  });
});
