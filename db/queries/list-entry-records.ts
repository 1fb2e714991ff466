import "server-only";
import { and, asc, eq, inArray } from "drizzle-orm";
import { getDb } from "../client";
import { records } from "../schema";
import { recordRowToRecord, type StoredRecord } from "./record-row-to-record";

/** Every record (voids and overrides included) of some entries of an event. */
export async function listEntryRecords({
  eventId,
  entryIds,
}: {
  eventId: string;
  entryIds: string[];
}): Promise<StoredRecord[]> {
  if (entryIds.length === 0) return [];
  const rows = await getDb()
    .select()
    .from(records)
    .where(and(eq(records.eventId, eventId), inArray(records.entryId, entryIds)))
    .orderBy(asc(records.id));
  return rows.map(recordRowToRecord);
}
