import "server-only";
import { count, eq, sql } from "drizzle-orm";
import { getDb } from "../client";
import { records } from "../schema";

/**
 * What the event pack's ETag knows of an event's records without reading them: how many there
 * are and the latest receive time (both from the `(event_id, received_at)` index). Records are
 * only ever added, so every new record changes the count.
 */
export async function getEventRecordsStamp({ eventId }: { eventId: string }) {
  const [row] = await getDb()
    .select({
      count: count(),
      lastReceivedAt: sql<string | null>`cast(max(${records.receivedAt}) as char)`,
    })
    .from(records)
    .where(eq(records.eventId, eventId));
  return { count: Number(row?.count ?? 0), lastReceivedAt: row?.lastReceivedAt ?? null };
}
