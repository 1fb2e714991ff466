import "server-only";
import { desc, eq } from "drizzle-orm";
import { type RunSheetPublication, runSheetSchema } from "../../../lib/paddock/run-sheet-schema";
import { getDb } from "../../client";
import { runGroupPublications } from "../../schema";

/** The event's newest published run sheet, or null before the first publication. A body that
 *  does not read as a run sheet is an error (publications are immutable and written by us). */
export async function getLatestRunSheet({
  eventId,
}: {
  eventId: string;
}): Promise<RunSheetPublication | null> {
  const [row] = await getDb()
    .select()
    .from(runGroupPublications)
    .where(eq(runGroupPublications.eventId, eventId))
    .orderBy(desc(runGroupPublications.version))
    .limit(1);
  if (!row) return null;
  return {
    id: row.id,
    eventId: row.eventId,
    version: row.version,
    publishedAt: row.publishedAt.toISOString(),
    publishedBy: row.publishedBy,
    body: runSheetSchema.parse(row.body),
  };
}
