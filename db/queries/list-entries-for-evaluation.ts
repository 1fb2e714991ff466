import "server-only";
import { and, eq, inArray } from "drizzle-orm";
import { getDb } from "../client";
import { entries } from "../schema";

/** The engine's view of some (or all) entries of an event: declared class and declarations. */
export async function listEntriesForEvaluation({
  eventId,
  entryIds,
}: {
  eventId: string;
  entryIds?: string[];
}) {
  if (entryIds && entryIds.length === 0) return [];
  return getDb()
    .select({
      entryId: entries.id,
      declaredClassId: entries.declaredClass,
      declarations: entries.declarations,
    })
    .from(entries)
    .where(
      entryIds
        ? and(eq(entries.eventId, eventId), inArray(entries.id, entryIds))
        : eq(entries.eventId, eventId),
    );
}
