import { recordSchema, type TechRecord } from "../scrutineer/records/record-schema";
import type { PackRecord } from "./event-pack-schema";
import type { LocalRecord } from "./local-record";

/**
 * An entry's records as this phone knows them: the server's (from the pack) united with its own,
 * by id. Records the server refused are left out of the preview (they stay listed in the outbox).
 */
export function mergeEntryRecords(
  entryId: string,
  packRecords: PackRecord[],
  local: LocalRecord[],
): TechRecord[] {
  const byId = new Map<string, TechRecord>();
  for (const raw of packRecords) {
    if (raw.entryId !== entryId) continue;
    const parsed = recordSchema.safeParse(raw);
    if (parsed.success) byId.set(parsed.data.id, parsed.data);
  }
  for (const item of local) {
    if (item.record.entryId !== entryId || item.state === "refused") continue;
    byId.set(item.record.id, item.record);
  }
  return [...byId.values()];
}
