import "server-only";
import { sql } from "drizzle-orm";
import { getDb } from "../../client";
import type { Tx } from "../../run-transaction";
import { jobs } from "../../schema";

export type NewJob = {
  kind: string;
  payload: unknown;
  /** A job with this key already queued (or done) makes this one a no-op. */
  dedupeKey?: string;
  delayMs?: number;
};

/**
 * Add jobs to the durable queue — in the caller's transaction when given one, so the work and the
 * promise to finish it commit together or not at all. Keys already enqueued are skipped.
 */
export async function enqueueJobs(newJobs: NewJob[], tx?: Tx): Promise<void> {
  if (newJobs.length === 0) return;
  await (tx ?? getDb())
    .insert(jobs)
    .values(
      newJobs.map((job) => ({
        kind: job.kind,
        payload: job.payload,
        dedupeKey: job.dedupeKey ?? null,
        status: "queued" as const,
        runAfter: sql`utc_timestamp(3) + interval ${Math.max(0, Math.round((job.delayMs ?? 0) * 1000))} microsecond`,
        createdAt: sql`utc_timestamp(3)`,
      })),
    )
    .onDuplicateKeyUpdate({ set: { id: sql`${jobs.id}` } });
}
