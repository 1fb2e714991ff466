import "server-only";
import type { EventRuleContext } from "../../db/queries/get-event-rule-set";
import { listEntriesForEvaluation } from "../../db/queries/list-entries-for-evaluation";
import { listEntryRecords } from "../../db/queries/list-entry-records";
import { displayUnits } from "../scrutineer/display-units";
import { storedEntryDeclarationsSchema } from "../scrutineer/entry-declarations-schema";
import type { ReEvaluationEntry } from "../scrutineer/re-evaluate-entries";
import { recordSchema, type TechRecord } from "../scrutineer/record-schema";

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
    const parsed = recordSchema.safeParse(row);
    if (!parsed.success) {
      // Stored records were checked on the way in and are read back without text maxima, so
      // this is damage in the database: say so, never drop a record in silence.
      console.error(
        "[verdicts] a stored record does not read as one",
        row.id,
        parsed.error.message,
      );
      continue;
    }
    // Push onto the entry's own list: copying it per row made loading an entry's n records O(n²).
    const list = byEntry.get(row.entryId);
    if (list) list.push(parsed.data);
    else byEntry.set(row.entryId, [parsed.data]);
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
