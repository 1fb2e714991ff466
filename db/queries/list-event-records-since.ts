import "server-only";
import { and, asc, eq, gt } from "drizzle-orm";
import { getDb } from "../client";
import { records } from "../schema";
import { recordRowToRecord, type StoredRecord } from "./record-row-to-record";

/** An event's records received after `since` (all of them without it), oldest first. */
export async function listEventRecordsSince({
  eventId,
  since,
}: {
  eventId: string;
  since?: Date | null;
}): Promise<StoredRecord[]> {
  const rows = await getDb()
    .select()
    .from(records)
    .where(
      since
        ? and(eq(records.eventId, eventId), gt(records.receivedAt, since))
        : eq(records.eventId, eventId),
    )
    .orderBy(asc(records.receivedAt), asc(records.id));
  return rows.map(recordRowToRecord);
}
