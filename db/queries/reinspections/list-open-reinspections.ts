import "server-only";
import { and, asc, eq, inArray, isNull } from "drizzle-orm";
import { getDb } from "../../client";
import { reinspections } from "../../schema";

/** The event's re-inspections not yet closed (only those of `entryIds`, if given), oldest first. */
export async function listOpenReinspections({
  eventId,
  entryIds,
}: {
  eventId: string;
  entryIds?: string[];
}) {
  if (entryIds && entryIds.length === 0) return [];
  const rows = await getDb()
    .select({
      id: reinspections.id,
      entryId: reinspections.entryId,
      cause: reinspections.cause,
      askedBy: reinspections.askedBy,
      askedAt: reinspections.askedAt,
      reason: reinspections.reason,
    })
    .from(reinspections)
    .where(
      and(
        eq(reinspections.eventId, eventId),
        isNull(reinspections.closedAt),
        entryIds ? inArray(reinspections.entryId, entryIds) : undefined,
      ),
    )
    .orderBy(asc(reinspections.askedAt));
  return rows.map((r) => ({ ...r, askedAt: r.askedAt.toISOString() }));
}
export type OpenReinspectionRow = Awaited<ReturnType<typeof listOpenReinspections>>[number];
