import "server-only";
import { and, eq, inArray, sql } from "drizzle-orm";
import { getDb } from "../../client";
import { jobs } from "../../schema";

/**
 * Put failed jobs this claim holds back in the queue to run after `delayMs`, or give them up
 * (`failed`, kept for an official to see and `npm run jobs:retry-failed` to queue again).
 */
export async function retryJobs({
  ids,
  leaseToken,
  error,
  delayMs,
  giveUp,
}: {
  ids: number[];
  leaseToken: string;
  error: string;
  delayMs: number;
  giveUp: boolean;
}): Promise<void> {
  if (ids.length === 0) return;
  await getDb()
    .update(jobs)
    .set({
      status: giveUp ? "failed" : "queued",
      runAfter: sql`utc_timestamp(3) + interval ${Math.round(delayMs * 1000)} microsecond`,
      lockedUntil: null,
      leaseToken: null,
      lastError: error.slice(0, 1000),
    })
    .where(and(inArray(jobs.id, ids), eq(jobs.status, "running"), eq(jobs.leaseToken, leaseToken)));
}
