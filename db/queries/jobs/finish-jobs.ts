import "server-only";
import { and, eq, inArray, sql } from "drizzle-orm";
import { getDb } from "../../client";
import { jobs } from "../../schema";

/**
 * Mark jobs done — only those this claim still holds (`leaseToken`): one taken back by another
 * worker after this one's lease ran out is that worker's to finish.
 */
export async function finishJobs({ ids, leaseToken }: { ids: number[]; leaseToken: string }) {
  if (ids.length === 0) return;
  await getDb()
    .update(jobs)
    .set({
      status: "done",
      doneAt: sql`utc_timestamp(3)`,
      lockedUntil: null,
      leaseToken: null,
      lastError: null,
    })
    .where(and(inArray(jobs.id, ids), eq(jobs.status, "running"), eq(jobs.leaseToken, leaseToken)));
}
