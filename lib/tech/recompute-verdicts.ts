import "server-only";
import { getEventRuleSet } from "../../db/queries/get-event-rule-set";
import { saveVerdicts } from "../../db/queries/save-verdicts";
import { AppError } from "../errors";
import { evaluateEntry } from "../scrutineer/evaluate-entry";
import { uncomputedVerdict } from "../scrutineer/uncomputed-verdict";
import type { Verdict, VerdictStatus } from "../scrutineer/verdict-schema";
import { loadEvaluationEntries } from "./load-evaluation-entries";
import { needsChiefScrutineer } from "./needs-chief-scrutineer";

export type VerdictChange = {
  entryId: string;
  before: { status: VerdictStatus; finalClass: string | null } | null;
  verdict: Verdict;
};

/**
 * Re-derive the verdicts of some entries (all when `entryIds` is omitted) from all their records
 * and the event's pinned rule set, store them, and report each with its previous status. Each
 * entry on its own: an evaluation that throws (a fault in the code) is logged and stored as a
 * verdict that waits for the chief scrutineer and says it could not be computed
 * (`uncomputedVerdict`), and the other entries' verdicts are stored as usual.
 */
export async function recomputeVerdicts({
  eventId,
  entryIds,
  now,
}: {
  eventId: string;
  entryIds?: string[];
  now: Date;
}): Promise<VerdictChange[]> {
  const context = await getEventRuleSet({ eventId });
  if (!context) throw new AppError("not_found", "No such event.");
  const inputs = await loadEvaluationEntries({ context, entryIds });
  // Entry by entry: one entry whose evaluation fails never stops the others' verdicts.
  const results = inputs.map((entryInput) => {
    const input = { ...entryInput, ruleSet: context.ruleSet };
    try {
      return { entryId: input.entry.entryId, verdict: evaluateEntry(input) };
    } catch (error) {
      const problem = error instanceof Error ? error.message : String(error);
      console.error(
        `verdict of entry ${input.entry.entryId} in event ${eventId} not computed:`,
        error,
      );
      return { entryId: input.entry.entryId, verdict: uncomputedVerdict(input, problem) };
    }
  });
  const before = await saveVerdicts({
    eventId,
    ruleSetVersionId: context.ruleSetVersionId,
    computedAt: now,
    rows: results.map(({ entryId, verdict }) => ({
      entryId,
      status: verdict.status,
      finalClass: verdict.classId,
      needsChief: needsChiefScrutineer(verdict),
      reason: verdict.reason,
      result: verdict,
      recordCount: verdict.records.total,
    })),
  });
  return results.map(({ entryId, verdict }) => ({
    entryId,
    before: before.get(entryId) ?? null,
    verdict,
  }));
}
