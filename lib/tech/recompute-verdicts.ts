import "server-only";
import { getEventRuleSet } from "../../db/queries/get-event-rule-set";
import { listEntriesForEvaluation } from "../../db/queries/list-entries-for-evaluation";
import { listEntryRecords } from "../../db/queries/list-entry-records";
import { saveVerdicts } from "../../db/queries/save-verdicts";
import { AppError } from "../errors";
import { displayUnits } from "../scrutineer/display-units";
import { entryDeclarationsSchema } from "../scrutineer/entry-declarations-schema";
import { evaluateEntry } from "../scrutineer/evaluate-entry";
import { recordSchema, type TechRecord } from "../scrutineer/record-schema";
import type { Verdict, VerdictStatus } from "../scrutineer/verdict-schema";
import { needsChiefScrutineer } from "./needs-chief-scrutineer";

export type VerdictChange = {
  entryId: string;
  before: { status: VerdictStatus; finalClass: string | null } | null;
  verdict: Verdict;
};

/**
 * Re-derive the verdicts of some entries (all when `entryIds` is omitted) from all their records
 * and the event's pinned rule set, store them, and report each with its previous status.
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
  const entries = await listEntriesForEvaluation({ eventId, entryIds });
  const stored = await listEntryRecords({ eventId, entryIds: entries.map((e) => e.entryId) });
  const byEntry = new Map<string, TechRecord[]>();
  for (const row of stored) {
    const parsed = recordSchema.safeParse(row);
    if (!parsed.success) continue; // stored records were validated on the way in
    byEntry.set(row.entryId, [...(byEntry.get(row.entryId) ?? []), parsed.data]);
  }
  const display = displayUnits({ length: context.unitSystem });
  const results = entries.map((entry) => ({
    entryId: entry.entryId,
    verdict: evaluateEntry({
      ruleSet: context.ruleSet,
      entry: {
        entryId: entry.entryId,
        declaredClassId: entry.declaredClassId,
        declarations: entryDeclarationsSchema.parse(entry.declarations),
      },
      records: byEntry.get(entry.entryId) ?? [],
      eventDate: context.eventDate,
      display,
    }),
  }));
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
