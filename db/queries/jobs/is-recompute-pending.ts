import "server-only";
import { and, eq, inArray, sql } from "drizzle-orm";
import { getDb } from "../../client";
import { jobs } from "../../schema";

/**
 * Whether a queued or running recompute job names this entry: its stored verdict may not count
 * every record yet. Ask before reading the verdict (see listPendingRecomputes).
 */
export async function isRecomputePending({ entryId }: { entryId: string }): Promise<boolean> {
  const [row] = await getDb()
    .select({ id: jobs.id })
    .from(jobs)
    .where(
      and(
        inArray(jobs.status, ["queued", "running"]),
        eq(jobs.kind, "recompute-verdicts"),
        sql`json_contains(json_extract(${jobs.payload}, '$.entryIds'), json_quote(${entryId}))`,
      ),
    )
    .limit(1);
  return row !== undefined;
}
