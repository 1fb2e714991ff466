import "server-only";
import { and, eq, inArray, sql } from "drizzle-orm";
import { getDb } from "../../client";
import { jobs } from "../../schema";

/** Mark jobs done. Only a job still running is marked: one taken back meanwhile is not ours. */
export async function finishJobs(ids: number[]): Promise<void> {
  if (ids.length === 0) return;
  await getDb()
    .update(jobs)
    .set({ status: "done", doneAt: sql`utc_timestamp(3)`, lockedUntil: null, lastError: null })
    .where(and(inArray(jobs.id, ids), eq(jobs.status, "running")));
}
