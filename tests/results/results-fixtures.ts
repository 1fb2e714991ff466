import type { ResultsEntry } from "@/lib/results/tech-results-input";
import type { TechRecord } from "@/lib/scrutineer/records/record-schema";
import type { RuleSetInput } from "@/lib/scrutineer/rule-sets/rule-set-schema";
import { evaluateEntry } from "@/lib/scrutineer/verdicts/evaluate-entry";
import type { Verdict } from "@/lib/scrutineer/verdicts/verdict-schema";
import { clubRuleSet, input, lengthReading, override, voidRecord } from "../scrutineer/fixtures";

export const IN = 25.4; // Source: NIST SP 811 App. B.8 — 1 in = 25.4 mm exactly

/** A car inside the fixture's club rule (5 in behind, 8 in above the roof, span ≤ body).
 *  Source: common practice (no source) — the club rule of tests/scrutineer/fixtures.ts. */
export const inside: TechRecord[] = [
  lengthReading(1, "wingTopFromGroundMm", 1300 + 7 * IN),
  lengthReading(2, "roofPeakFromGroundMm", 1300),
  lengthReading(3, "wingOverhangMm", 4 * IN),
  lengthReading(4, "wingSpanMm", 64 * IN),
  lengthReading(5, "bodyWidthMm", 64.5 * IN),
];
/** The same car with its wing 9 in above the roof: over the club rule's 8 in. */
export const wingHigh: TechRecord[] = [
  lengthReading(1, "wingTopFromGroundMm", 1300 + 9 * IN),
  ...inside.slice(1),
];

/** A rule set where a wing too far behind the car stops it (held) instead of moving it up. */
export const overhangStops: RuleSetInput = {
  ...clubRuleSet(),
  onViolation: { "wing-overhang": "stop" },
};
/** A car whose wing sits 6 in behind: over the club rule's 5 in. */
export const overhangLong: TechRecord[] = [
  ...inside.slice(0, 2),
  lengthReading(3, "wingOverhangMm", 6 * IN),
  ...inside.slice(3),
];

/** A verdict from the real engine for one car of the club ladder. */
export function verdictFor(
  entryId: string,
  records: TechRecord[],
  ruleSet: RuleSetInput = clubRuleSet(),
): Verdict {
  return {
    ...evaluateEntry(input({ ruleSet, records, declaredClassId: "club" })),
    entryId,
  };
}

/** Test values, not trade facts: an entry of the fixture event. */
export function entry(
  entryId: string,
  carNumber: number,
  driver = `Driver ${carNumber}`,
): ResultsEntry {
  return {
    entryId,
    carNumber,
    declaredClass: "club",
    declaredClassName: "Club",
    make: "Mazda",
    model: "MX-5",
    year: 1999,
    colour: "Blue",
    driverName: driver,
    coDriverName: null,
  };
}

export { override, voidRecord };
