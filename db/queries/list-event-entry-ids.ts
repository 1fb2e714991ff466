import "server-only";
import { and, eq, inArray, ne } from "drizzle-orm";
import { getDb } from "../client";
import { entries } from "../schema";

/** Which of these ids are entries of the event (a car on the waiting list is not in the field,
 *  so the tech line takes nothing for it). */
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
    .where(
      and(
        eq(entries.eventId, eventId),
        inArray(entries.id, entryIds),
        ne(entries.status, "waiting"),
      ),
    );
  return new Set(rows.map((r) => r.id));
}
