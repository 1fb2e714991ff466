import type { EvaluateEntryInput } from "./evaluate-entry-input-schema";
import { VERDICT_NOTICE } from "./verdict-notice";
import type { Verdict } from "./verdict-schema";

/**
 * The verdict stored for an entry whose evaluation failed (a fault in the code, never the entry's
 * data: `evaluateEntry` refuses bad data in words). It waits, for the chief scrutineer (flag
 * "not-computed"), and says so: an older verdict is not kept, because it may clear a car that
 * records received since should stop. Waiting sends no e-mail and never lets a car run.
 * @param problem what went wrong, for the chief scrutineer and the organizer
 */
export function uncomputedVerdict(
  input: Pick<EvaluateEntryInput, "ruleSet" | "entry" | "records" | "eventDate" | "display">,
  problem: string,
): Verdict {
  const { ruleSet, entry } = input;
  return {
    entryId: entry.entryId,
    ruleSetId: ruleSet.id,
    ruleSetVersion: ruleSet.version,
    eventDate: input.eventDate,
    declaredClassId: entry.declaredClassId,
    status: "waiting",
    classId: entry.declaredClassId,
    fallbackClassId: null,
    reason: `Waiting — the verdict could not be computed (${problem}). The chief scrutineer decides; tell the organizer so it is fixed.`,
    flags: ["not-computed"],
    override: null,
    rejectedOverride: null,
    reinspection: null,
    classChecks: [],
    eventRules: [],
    safety: [],
    dimensions: [],
    setAside: [],
    missing: [],
    implausibleReadings: [],
    records: { total: input.records.length, used: 0, voided: 0, ignored: 0 },
    display: input.display,
    notice: VERDICT_NOTICE,
  };
}
