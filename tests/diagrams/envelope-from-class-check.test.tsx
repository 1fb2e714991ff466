import { describe, expect, it } from "vitest";
import { ClassEnvelope } from "@/components/diagrams/class-envelope";
import { envelopeFromClassCheck } from "@/components/diagrams/envelope-from-class-check";
import type { LengthDimension, TechRecord } from "@/lib/scrutineer/records/record-schema";
import { evaluateEntry } from "@/lib/scrutineer/verdicts/evaluate-entry";
import { evaluateEntryInputSchema } from "@/lib/scrutineer/verdicts/evaluate-entry-input-schema";
import type { Verdict } from "@/lib/scrutineer/verdicts/verdict-schema";
import { partByTestId, render, textOf } from "./render-markup";

// Source: Motorsport UK NCR 2026 Ch.14 App.4 — wing top ≤ 200 mm above the roof's highest point
// and ≤ 200 mm behind the rearmost bodywork. Span no wider than the body, end plates counted:
// common practice (no source).
const wing = {
  allowed: true as const,
  height: { reference: "roof-peak" as const, maxMm: 200 },
  maxOverhangMm: 200,
  span: { allowanceOverBodyMm: 0, endPlatesCounted: true },
  maxChordMm: null,
};
const ROOF_MM = 1300; // roof peak from the ground of an arbitrary test car

function ruleSet(classWing: typeof wing | { allowed: false }) {
  return {
    schemaVersion: 1,
    id: "diagram-test",
    version: 1,
    name: "Diagram test rule set",
    classes: [
      {
        id: "limited",
        name: "Limited",
        aero: { wing: classWing, splitter: { allowed: true, maxProtrusionMm: null, width: null } },
      },
      {
        id: "open",
        name: "Open",
        aero: {
          wing: { allowed: true, height: null, maxOverhangMm: null, span: null, maxChordMm: null },
          splitter: { allowed: true, maxProtrusionMm: null, width: null },
        },
      },
    ],
    decisionRule: { kind: "simple" },
    measurement: {
      aero: { driverAboard: false },
      weighing: { driverAboard: false },
      references: {
        roofPeak: "roof's highest point",
        rearmostBodywork: "rearmost bodywork",
        bodyWidth: "body at its widest, mirrors excluded",
        splitterFront: "bumper's foremost point",
      },
    },
    safety: { standards: [], checklist: [] },
  };
}

function reading(n: number, dimension: LengthDimension, value: number): TechRecord {
  return {
    id: `01960000-0000-7000-8000-${n.toString(16).padStart(12, "0")}`,
    entryId: "entry-1",
    officialId: "scrutineer-a",
    deviceId: "phone-1",
    deviceTime: `2026-05-16T09:0${n}:00+01:00`,
    kind: "reading",
    payload: { dimension, value, instrument: { id: "tape", name: "Tape", standardUncertainty: 1 } },
  };
}

function verdictFor(
  records: TechRecord[],
  classWing: typeof wing | { allowed: false } = wing,
  length: "mm" | "in" = "mm",
): Verdict {
  return evaluateEntry(
    evaluateEntryInputSchema.parse({
      ruleSet: ruleSet(classWing),
      entry: {
        entryId: "entry-1",
        declaredClassId: "limited",
        declarations: { aero: { wing: true } },
      },
      records,
      eventDate: "2026-05-16",
      display: { length },
    }),
  );
}

function props(v: Verdict, classWing: typeof wing | { allowed: false } = wing) {
  const check = v.classChecks.find((c) => c.classId === "limited");
  if (!check) throw new Error("no class check for the limited class");
  return envelopeFromClassCheck({
    check,
    dimensions: v.dimensions,
    unit: v.display.length,
    wing: classWing,
  });
}

describe("feeding the class envelope from a verdict", () => {
  it("a wing 205 mm above the roof is drawn over, with the verdict's own margin words", () => {
    const v = verdictFor([
      reading(1, "wingTopFromGroundMm", ROOF_MM + 205),
      reading(2, "roofPeakFromGroundMm", ROOF_MM),
      reading(3, "wingOverhangMm", 150),
      reading(4, "wingSpanMm", 1480),
      reading(5, "bodyWidthMm", 1500),
    ]);
    const p = props(v);
    expect(p?.height).toMatchObject({ limitMm: 200, outcome: "fail", marginText: "over by 5 mm" });
    expect(p?.height.measuredMm).toBeCloseTo(205, 9);
    expect(p?.overhang).toMatchObject({ limitMm: 200, measuredMm: 150, outcome: "pass" });
    expect(p?.span).toMatchObject({ wingSpanMm: 1480, bodyWidthMm: 1500, outcome: "pass" });
    if (!p) throw new Error("expected props");
    const markup = render(<ClassEnvelope {...p} />);
    expect(textOf(partByTestId(markup, "envelope-height"))).toContain("over by 5 mm");
    expect(textOf(partByTestId(markup, "envelope-overhang"))).toContain("50 mm inside");
    expect(textOf(markup)).toContain("Class envelope: Limited");
  });

  it("readings still to take come through as not measured yet, with the class's limits", () => {
    const p = props(verdictFor([reading(1, "wingTopFromGroundMm", ROOF_MM + 100)]));
    expect(p?.height).toMatchObject({ limitMm: 200, measuredMm: null, outcome: "waiting" });
    expect(p?.span).toMatchObject({ limitMm: 0, measuredMm: null, wingSpanMm: null });
    if (!p) throw new Error("expected props");
    expect(textOf(partByTestId(render(<ClassEnvelope {...p} />), "envelope-height"))).toContain(
      "not measured yet",
    );
  });

  it("shows the verdict's margins in inches when the event shows inches", () => {
    // Source: NIST SP 811 App. B.8 — 1 in = 25.4 mm exactly: 5 mm over is 0.2 in (0.19685 in)
    const v = verdictFor(
      [
        reading(1, "wingTopFromGroundMm", ROOF_MM + 205),
        reading(2, "roofPeakFromGroundMm", ROOF_MM),
      ],
      wing,
      "in",
    );
    const p = props(v);
    expect(p?.unit).toBe("in");
    expect(p?.height.marginText).toBe("over by 0.2 in");
  });

  it("draws no envelope where the class allows no wing", () => {
    const closed = { allowed: false as const };
    expect(props(verdictFor([reading(1, "wingSpanMm", 1400)], closed), closed)).toBeNull();
  });
});
