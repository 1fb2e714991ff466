import "server-only";
import { and, eq, inArray } from "drizzle-orm";
import { getDb } from "../client";
import { entries } from "../schema";

/** Which of these ids are entries of the event. */
export async function listEventEntryIds({
  eventId,
  entryIds,
}: {
  eventId: string;
  entryIds: string[];
}) {
  if (entryIds.length === 0) return new Set<string>();
  const rows = await getDb()
    .select({ id: entries.id })
    .from(entries)
    .where(and(eq(entries.eventId, eventId), inArray(entries.id, entryIds)));
  return new Set(rows.map((r) => r.id));
}
