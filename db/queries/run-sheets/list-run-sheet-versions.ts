import "server-only";
import { desc, eq } from "drizzle-orm";
import { getDb } from "../../client";
import { runGroupPublications, users } from "../../schema";

/** Every published version of an event's run sheet, newest first: number, time and publisher. */
export async function listRunSheetVersions({ eventId }: { eventId: string }) {
  const rows = await getDb()
    .select({
      version: runGroupPublications.version,
      publishedAt: runGroupPublications.publishedAt,
      publishedBy: users.name,
    })
    .from(runGroupPublications)
    .leftJoin(users, eq(users.id, runGroupPublications.publishedBy))
    .where(eq(runGroupPublications.eventId, eventId))
    .orderBy(desc(runGroupPublications.version));
  return rows.map((r) => ({ ...r, publishedAt: r.publishedAt.toISOString() }));
}
