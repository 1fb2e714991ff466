import "server-only";
import { createHash } from "node:crypto";
import { getEventRuleSet } from "../../db/queries/get-event-rule-set";
import { enqueueJobs } from "../../db/queries/jobs/enqueue-jobs";
import { listEntryContacts } from "../../db/queries/list-entry-contacts";
import { listOpenReinspections } from "../../db/queries/reinspections/list-open-reinspections";
import { saveVerdicts } from "../../db/queries/save-verdicts";
import { runTransaction } from "../../db/run-transaction";
import { withNamedLock } from "../../db/with-named-lock";
import { clock } from "../clock";
import { env } from "../env";
import { AppError } from "../errors";
import { stableStringify } from "../scrutineer/records/stable-stringify";
import { applyReinspection } from "../scrutineer/verdicts/apply-reinspection";
import { evaluateEntry } from "../scrutineer/verdicts/evaluate-entry";
import { uncomputedVerdict } from "../scrutineer/verdicts/uncomputed-verdict";
import type { Verdict, VerdictStatus } from "../scrutineer/verdicts/verdict-schema";
import { formatClockTime } from "./format-clock-time";
import { loadEvaluationEntries } from "./load-evaluation-entries";
import { needsChiefScrutineer } from "./needs-chief-scrutineer";
import { verdictChangeMails } from "./verdict-change-mails";
import { verdictMoved } from "./verdict-moved";

export type VerdictChange = {
  entryId: string;
  before: { status: VerdictStatus; finalClass: string | null } | null;
  verdict: Verdict;
};

/**
 * Re-derive the verdicts of some entries (all when `entryIds` is omitted) from all their records
 * and the event's pinned rule set (read once), holding the event's recompute lock, then, in one
 * transaction, store them and enqueue
 * the e-mails of the verdicts that changed — so a recompute run twice (its worker died before
 * marking the job done) finds nothing changed the second time and mails nobody twice. Each entry
 * on its own: an evaluation that throws (a fault in the code) is logged and stored as a verdict
 * that waits for the chief scrutineer and says it could not be computed (`uncomputedVerdict`).
 */
export async function recomputeVerdicts({
  eventId,
  entryIds,
  now,
}: {
  eventId: string;
  entryIds?: string[];
  now: Date;
}): Promise<{ changes: VerdictChange[]; mailsQueued: number }> {
  // One recompute of an event at a time (the worker's, a pin's): each reads the rule set and
  // the records after the one before it has saved, so an older verdict never lands last.
  return withNamedLock(`plumbline-recompute:${eventId}`, 60, async () => {
    const context = await getEventRuleSet({ eventId });
    if (!context) throw new AppError("not_found", "No such event.");
    const inputs = await loadEvaluationEntries({ context, entryIds });
    // A car sent back for re-inspection waits until the chief scrutineer closes it.
    const reinspections = new Map(
      (await listOpenReinspections({ eventId, entryIds })).map((r) => [r.entryId, r]),
    );
    const results = inputs.map((entryInput) => {
      const input = { ...entryInput, ruleSet: context.ruleSet };
      const open = reinspections.get(input.entry.entryId);
      try {
        const computed = evaluateEntry(input);
        const verdict = applyReinspection(
          computed,
          open
            ? {
                ...open,
                askedAtText: formatClockTime(open.askedAt, context.timeZone).slice(0, 5),
              }
            : null,
        );
        return { entryId: input.entry.entryId, verdict };
      } catch (error) {
        const problem = error instanceof Error ? error.message : String(error);
        console.error(
          `verdict of entry ${input.entry.entryId} in event ${eventId} not computed:`,
          error,
        );
        return { entryId: input.entry.entryId, verdict: uncomputedVerdict(input, problem) };
      }
    });
    const rows = results.map(({ entryId, verdict }) => ({
      entryId,
      status: verdict.status,
      finalClass: verdict.classId,
      needsChief: needsChiefScrutineer(verdict),
      reason: verdict.reason,
      result: verdict,
      resultHash: createHash("sha256").update(stableStringify(verdict)).digest("hex"),
      recordCount: verdict.records.total,
    }));
    return runTransaction(async (tx) => {
      // Stamped when saved (each attempt anew), not when the work began: a phone's partial pack
      // finds verdicts by this time, a little behind the pack's own.
      const computedAt = laterOf(now, clock.now());
      const before = await saveVerdicts({
        tx,
        eventId,
        ruleSetVersionId: context.ruleSetVersionId,
        computedAt,
        rows,
      });
      const changes = results.map(({ entryId, verdict }) => ({
        entryId,
        before: before.get(entryId) ?? null,
        verdict,
      }));
      const moved = changes.filter((c) => c.verdict.status !== "waiting" && verdictMoved(c));
      const contacts =
        moved.length === 0
          ? []
          : await listEntryContacts({ eventId, entryIds: moved.map((c) => c.entryId) });
      const mails = verdictChangeMails({
        eventId,
        changes,
        contacts,
        ruleSet: context.ruleSet,
        computedAt,
        appUrl: env.APP_URL,
      });
      await enqueueJobs(mails, tx);
      return { changes, mailsQueued: mails.length };
    });
  });
}

const laterOf = (a: Date, b: Date) => (a.getTime() >= b.getTime() ? a : b);
