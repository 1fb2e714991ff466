import { describe, expect, it } from "vitest";
import { overrideClassChoices } from "@/lib/scrutineer/classes/override-class-choices";
import { overrideTargetProblem } from "@/lib/scrutineer/classes/override-target-problem";
import type { TechRecord } from "@/lib/scrutineer/records/record-schema";
import type { RuleSetInput } from "@/lib/scrutineer/rule-sets/rule-set-schema";
import { evaluateEntry } from "@/lib/scrutineer/verdicts/evaluate-entry";
import { clubRuleSet, input, lengthReading, override } from "./fixtures";

// A ladder of four classes, low → high (invented names; the order is what matters).
// Source: common practice (no source) — a car over its class's limits moves up to a higher class,
// never down; a car that fits is cleared in the class it was entered in (DOMAIN.md, Classing).
const ladder = [
  { id: "k", name: "Kestrel" },
  { id: "m", name: "Merlin" },
  { id: "h", name: "Harrier" },
  { id: "p", name: "Peregrine" },
];
const problem = (status: "cleared" | "moved-up" | "held", classId: string | null) =>
  overrideTargetProblem({ classes: ladder, declaredClassId: "h", status, classId });

describe("overrideTargetProblem: what a chief scrutineer's decision may name", () => {
  it("accepts cleared in the declared class, moved up above it, and held with no class", () => {
    expect(problem("cleared", "h")).toBeNull();
    expect(problem("moved-up", "p")).toBeNull();
    expect(problem("held", null)).toBeNull();
  });

  it("refuses moving a Harrier car 'up' into Kestrel, and says why in words", () => {
    expect(problem("moved-up", "k")).toBe(
      "Kestrel is below Harrier, the class this car was entered in: a car is cleared in its own class or moved up, never down.",
    );
  });

  it("refuses cleared in another class, moved up to the same class, a held car with a class and an unknown class", () => {
    expect(problem("cleared", "p")).toMatch(/choose "Moved up"/);
    expect(problem("cleared", "m")).toMatch(/below Harrier/);
    expect(problem("moved-up", "h")).toMatch(/choose "Cleared"/);
    expect(problem("held", "h")).toBe("A held car runs in no class.");
    expect(problem("cleared", null)).toBe("Choose the class the car runs in.");
    expect(problem("moved-up", "gt1")).toBe(`There is no class "gt1" in this event's class rules.`);
  });

  it("offers exactly the classes it accepts", () => {
    const ids = (status: "cleared" | "moved-up" | "held", declaredClassId: string) =>
      overrideClassChoices({ classes: ladder, declaredClassId, status }).map((c) => c.id);
    expect(ids("cleared", "h")).toEqual(["h"]);
    expect(ids("moved-up", "h")).toEqual(["p"]);
    expect(ids("moved-up", "k")).toEqual(["m", "h", "p"]);
    expect(ids("moved-up", "p")).toEqual([]); // the top class has nowhere to move up to
    expect(ids("held", "h")).toEqual([]);
  });
});

describe("evaluateEntry applies the same rule to overrides", () => {
  const IN = 25.4; // Source: NIST SP 811 App. B.8 — 1 in = 25.4 mm exactly
  const inside: TechRecord[] = [
    lengthReading(1, "wingTopFromGroundMm", 1300 + 7 * IN),
    lengthReading(2, "roofPeakFromGroundMm", 1300),
    lengthReading(3, "wingOverhangMm", 4 * IN),
    lengthReading(4, "wingSpanMm", 64 * IN),
    lengthReading(5, "bodyWidthMm", 64.5 * IN),
  ];
  const run = (
    records: TechRecord[],
    declaredClassId = "open",
    ruleSet: RuleSetInput = clubRuleSet(),
  ) => evaluateEntry(input({ ruleSet, records, declaredClassId }));

  it("ignores 'moved up' into a lower class, keeps the computed verdict and says why", () => {
    const v = run([
      ...inside,
      override(9, { status: "moved-up", classId: "club", reason: "asked for by the entrant" }),
    ]);
    expect(v.status).toBe("cleared");
    expect(v.classId).toBe("open");
    expect(v.flags).toContain("override-invalid");
    expect(v.override).toBeNull();
    expect(v.rejectedOverride).toMatchObject({
      officialId: "chief-1",
      status: "moved-up",
      classId: "club",
      problem:
        "Club is below Open, the class this car was entered in: a car is cleared in its own class or moved up, never down.",
    });
  });

  it("ignores 'cleared' in a class other than the declared one", () => {
    const v = run(
      [...inside, override(9, { status: "cleared", classId: "open", reason: "fits Open anyway" })],
      "club",
    );
    expect(v.flags).toContain("override-invalid");
    expect(v.rejectedOverride?.problem).toMatch(/choose "Moved up"/);
  });

  it("applies a fitting override with no rejected one", () => {
    const v = run(
      [
        ...inside,
        override(9, { status: "moved-up", classId: "open", reason: "wing re-fitted higher" }),
      ],
      "club",
    );
    expect(v.status).toBe("moved-up");
    expect(v.flags).not.toContain("override-invalid");
    expect(v.rejectedOverride).toBeNull();
  });
});
