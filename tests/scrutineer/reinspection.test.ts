import { describe, expect, it } from "vitest";
import type { TechRecord } from "@/lib/scrutineer/records/record-schema";
import { applyReinspection } from "@/lib/scrutineer/verdicts/apply-reinspection";
import { evaluateEntry } from "@/lib/scrutineer/verdicts/evaluate-entry";
import { verdictSchema } from "@/lib/scrutineer/verdicts/verdict-schema";
import { clubRuleSet, input, lengthReading } from "./fixtures";

const IN = 25.4; // Source: NIST SP 811 App. B.8 — 1 in = 25.4 mm exactly
/** A car inside the club rule. Source: common practice (no source). */
const inside: TechRecord[] = [
  lengthReading(1, "wingTopFromGroundMm", 1300 + 7 * IN),
  lengthReading(2, "roofPeakFromGroundMm", 1300),
  lengthReading(3, "wingOverhangMm", 4 * IN),
  lengthReading(4, "wingSpanMm", 64 * IN),
  lengthReading(5, "bodyWidthMm", 64.5 * IN),
];

describe("a car sent back for re-inspection waits", () => {
  // Source: Motorsport UK NCR 2026 Ch.3 App.6 (as DOMAIN.md notes) — re-inspection after an
  // incident or a protest; provisional results stand only until protest time has expired.
  const cleared = evaluateEntry(
    input({ ruleSet: clubRuleSet(), records: inside, declaredClassId: "club" }),
  );

  it("turns a cleared car to Waiting, says who asked and why, and keeps the computed verdict", () => {
    expect(cleared.status).toBe("cleared");
    const waiting = applyReinspection(cleared, {
      cause: "protest",
      askedBy: "the entrant of car 12",
      askedAt: "2027-06-12T13:05:00.000Z",
      askedAtText: "14:05",
      reason: "Wing looks higher than at scrutineering.",
    });
    expect(waiting.status).toBe("waiting");
    expect(waiting.reason).toBe(
      "Sent back for re-inspection after a protest, asked by the entrant of car 12 at 14:05: Wing looks higher than at scrutineering. Waiting until it has been looked at again.",
    );
    expect(waiting.flags).toContain("reinspection");
    expect(waiting.reinspection?.computedStatus).toBe("cleared");
    expect(verdictSchema.parse(waiting)).toEqual(waiting);
  });

  it("changes nothing when no re-inspection is open", () => {
    expect(applyReinspection(cleared, null)).toBe(cleared);
  });

  it("reads verdicts stored before re-inspections existed", () => {
    const { reinspection: _, ...old } = cleared;
    expect(verdictSchema.parse(old).reinspection).toBeNull();
  });
});
