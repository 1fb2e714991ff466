import "server-only";
import { count, eq } from "drizzle-orm";
import { getDb } from "../client";
import { records } from "../schema";

/** How many tech-line records each entry of the event has (entries with none are left out). */
export async function countEventRecordsByEntry({
  eventId,
}: {
  eventId: string;
}): Promise<Map<string, number>> {
  const rows = await getDb()
    .select({ entryId: records.entryId, n: count() })
    .from(records)
    .where(eq(records.eventId, eventId))
    .groupBy(records.entryId);
  return new Map(rows.map((r) => [r.entryId, Number(r.n)]));
}
