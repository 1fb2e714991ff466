import type { TechRecordOf } from "../records/record-schema";
import type { RuleSet } from "../rule-sets/rule-set-schema";
import type { SafetyItemResult } from "../verdicts/verdict-schema";
import { checkSafetyItem } from "./check-safety-item";

/**
 * Checks every checklist item of the rule set against the latest answer for it, and certified
 * equipment against its standard's expiry policy on the event date. A failed item or expired or
 * unaccepted equipment holds the car (safety never moves a car up); expiring within the warning
 * window passes with a warning; a label to re-read waits.
 * @returns the item results, and the ids of answers for items the rule set does not list
 */
export function checkSafety(
  ruleSet: RuleSet,
  answers: ReadonlyMap<string, TechRecordOf<"checklist">>,
  eventDate: string,
): { items: SafetyItemResult[]; unknownItemIds: string[] } {
  const standards = new Map(ruleSet.safety.standards.map((s) => [s.id, s]));
  const items = ruleSet.safety.checklist.map((item) =>
    checkSafetyItem({
      item,
      answer: answers.get(item.id),
      standards,
      eventDate,
      warningDays: ruleSet.safety.expiryWarningDays,
    }),
  );
  const listed = new Set(ruleSet.safety.checklist.map((i) => i.id));
  const unknownItemIds = [...answers.keys()].filter((id) => !listed.has(id)).sort();
  return { items, unknownItemIds };
}
