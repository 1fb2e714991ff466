import "server-only";
import { and, count, eq, inArray } from "drizzle-orm";
import { getDb } from "../client";
import { records } from "../schema";

/** How many voids each of these entries already has on the server. */
export async function countEntryVoids({
  eventId,
  entryIds,
}: {
  eventId: string;
  entryIds: string[];
}): Promise<Map<string, number>> {
  if (entryIds.length === 0) return new Map();
  const rows = await getDb()
    .select({ entryId: records.entryId, voids: count() })
    .from(records)
    .where(
      and(
        eq(records.eventId, eventId),
        inArray(records.entryId, entryIds),
        eq(records.kind, "void"),
      ),
    )
    .groupBy(records.entryId);
  return new Map(rows.map((r) => [r.entryId, Number(r.voids)]));
}
