import { describe, expect, it } from "vitest";
import { deriveAeroGeometry } from "@/lib/scrutineer/aero/derive-aero-geometry";
import { summariseDimensions } from "@/lib/scrutineer/measurement/summarise-dimensions";
import type { TechRecord } from "@/lib/scrutineer/records/record-schema";
import type { RuleSetInput } from "@/lib/scrutineer/rule-sets/rule-set-schema";
import { ruleSetSchema } from "@/lib/scrutineer/rule-sets/rule-set-schema";
import { evaluateEntry } from "@/lib/scrutineer/verdicts/evaluate-entry";
import { clubRuleSet, input, lengthReading } from "./fixtures";

const IN = 25.4; // Source: NIST SP 811 App. B.8 — 1 in = 25.4 mm exactly

function judge(
  records: TechRecord[],
  ruleSet: RuleSetInput = clubRuleSet(),
  length: "mm" | "in" = "in",
) {
  return evaluateEntry(
    input({ ruleSet, records, declaredClassId: ruleSet.classes[0]?.id ?? "", length }),
  );
}

/** One class with the given aero limits, and an unlimited class above it. */
function ladder(limited: RuleSetInput["classes"][number]["aero"]): RuleSetInput {
  const base = clubRuleSet();
  return {
    ...base,
    classes: [{ id: "limited", name: "Limited", aero: limited }, ...base.classes.slice(1)],
  };
}

describe("geometry from raw readings", () => {
  it("height above roof is wing top minus roof peak, with uncertainties in quadrature", () => {
    // Source: common practice (no source) — heights from the ground, above-roof = wing top − roof peak;
    // JCGM 100:2008 §5.1.2 — u² = u₁² + u₂² for a difference of uncorrelated inputs
    const rs = ruleSetSchema.parse(clubRuleSet());
    const records = [
      lengthReading(1, "wingTopFromGroundMm", 1510, 1.2),
      lengthReading(2, "roofPeakFromGroundMm", 1320, 0.5),
    ];
    const { dimensions } = summariseDimensions(
      records.filter((r) => r.kind === "reading"),
      rs,
    );
    const g = deriveAeroGeometry(dimensions);
    expect(g.heightAboveRoofMm.ok).toBe(true);
    if (g.heightAboveRoofMm.ok) {
      expect(g.heightAboveRoofMm.measurand.value).toBe(190);
      expect(g.heightAboveRoofMm.measurand.standardUncertainty).toBeCloseTo(1.3, 12);
    }
    expect(g.overhangMm).toEqual({ ok: false, missing: ["wingOverhangMm"] });
  });

  it("a rule that does not count the end plates takes both off the span", () => {
    // Source: common practice (no source) — whether end plates count in the span is part of the rule
    const rs = ladder({
      wing: {
        allowed: true,
        height: null,
        maxOverhangMm: null,
        span: { allowanceOverBodyMm: 0, endPlatesCounted: false },
        maxChordMm: null,
      },
      splitter: { allowed: true, maxProtrusionMm: null, width: null },
    });
    const car = [
      lengthReading(1, "wingSpanMm", 64.5 * IN),
      lengthReading(2, "bodyWidthMm", 64 * IN),
    ];
    expect(judge(car, rs).classChecks[0]?.rules[0]?.outcome).toBe("waiting");
    const v = judge([...car, lengthReading(3, "endPlateThicknessMm", 0.25 * IN)], rs);
    expect(v.status).toBe("cleared");
    expect(v.classChecks[0]?.rules[0]?.reason).toBe(
      "Wing span 64 in, without end plates, on a body 64 in wide; limit the body's width; exactly on the limit.",
    );
  });
});
