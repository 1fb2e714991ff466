import "server-only";
import type { EventRuleContext } from "../../db/queries/get-event-rule-set";
import { listEntriesForEvaluation } from "../../db/queries/list-entries-for-evaluation";
import { listEntryRecords } from "../../db/queries/list-entry-records";
import { storedEntryDeclarationsSchema } from "../scrutineer/classes/entry-declarations-schema";
import type { TechRecord } from "../scrutineer/records/record-schema";
import { displayUnits } from "../scrutineer/units/display-units";
import type { ReEvaluationEntry } from "../scrutineer/verdicts/re-evaluate-entries";
import { readStoredRecord } from "./read-stored-record";

/**
 * Everything `evaluateEntry` needs for some (or all) entries of an event except the rule set:
 * the declared class and declarations, all the entry's records, the event date and units.
 */
export async function loadEvaluationEntries({
  context,
  entryIds,
}: {
  context: EventRuleContext;
  entryIds?: string[];
}): Promise<ReEvaluationEntry[]> {
  const { eventId } = context;
  const entries = await listEntriesForEvaluation({ eventId, entryIds });
  const stored = await listEntryRecords({ eventId, entryIds: entries.map((e) => e.entryId) });
  const byEntry = new Map<string, TechRecord[]>();
  for (const row of stored) {
    const record = readStoredRecord(row);
    if (record === null) continue;
    // Push onto the entry's own list: copying it per row made loading an entry's n records O(n²).
    const list = byEntry.get(row.entryId);
    if (list) list.push(record);
    else byEntry.set(row.entryId, [record]);
  }
  const display = displayUnits({ length: context.unitSystem });
  return entries.map((entry) => ({
    entry: {
      entryId: entry.entryId,
      declaredClassId: entry.declaredClassId,
      declarations: storedEntryDeclarationsSchema.parse(entry.declarations),
    },
    records: byEntry.get(entry.entryId) ?? [],
    eventDate: context.eventDate,
    display,
  }));
}
