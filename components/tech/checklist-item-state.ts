import type { SafetyItemResult } from "@/lib/scrutineer/verdicts/verdict-schema";

/** The three state colours of DESIGN.md, plus plain grey for "not yet" and "not fitted". */
export type StateTone = "cleared" | "attention" | "stopped" | "waiting" | "neutral";

/**
 * How a safety item stands, in one word and a tone, from the engine's result: passed, passed
 * but expiring within the rule set's warning window (attention, like Re-measure), failed, not
 * fitted, not checked yet, or answered but to look at again (a label to re-read).
 */
export function checklistItemState(result: SafetyItemResult | undefined): {
  tone: StateTone;
  word: string;
} {
  if (result === undefined) return { tone: "waiting", word: "Not checked yet" };
  const answered = result.recordId !== null;
  switch (result.outcome) {
    case "pass":
      return result.equipment?.status === "expires-soon"
        ? { tone: "attention", word: "Passed · expires soon" }
        : { tone: "cleared", word: "Passed" };
    case "fail":
      return { tone: "stopped", word: "Failed" };
    case "not-applicable":
      return answered
        ? { tone: "neutral", word: "Not fitted" }
        : { tone: "neutral", word: "Not checked (optional)" };
    default:
      return answered
        ? { tone: "attention", word: "Look again" }
        : { tone: "waiting", word: "Not checked yet" };
  }
}
