import "server-only";
import { and, eq, inArray } from "drizzle-orm";
import { getDb } from "../client";
import { records } from "../schema";

type RecordKind = (typeof records.$inferSelect)["kind"];

/** Who made each of these records of an event, of what kind and for which entry (for the void rule). */
export async function listRecordAuthors({
  eventId,
  recordIds,
}: {
  eventId: string;
  recordIds: string[];
}): Promise<Map<string, { kind: RecordKind; entryId: string; officialId: string }>> {
  if (recordIds.length === 0) return new Map();
  const rows = await getDb()
    .select({
      id: records.id,
      kind: records.kind,
      entryId: records.entryId,
      officialId: records.officialId,
    })
    .from(records)
    .where(and(eq(records.eventId, eventId), inArray(records.id, recordIds)));
  return new Map(
    rows.map((r) => [r.id, { kind: r.kind, entryId: r.entryId, officialId: r.officialId }]),
  );
}
