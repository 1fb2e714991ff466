import "server-only";
import { eq, sql } from "drizzle-orm";
import { getDb } from "../../client";
import { jobs } from "../../schema";

/** Put every given-up job back in the queue with fresh attempts (after the cause is mended). */
export async function requeueFailedJobs(): Promise<number> {
  const [result] = await getDb()
    .update(jobs)
    .set({ status: "queued", attempts: 0, runAfter: sql`utc_timestamp(3)`, leaseToken: null })
    .where(eq(jobs.status, "failed"));
  return result.affectedRows;
}
