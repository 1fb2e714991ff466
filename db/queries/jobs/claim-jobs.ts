import "server-only";
import { randomUUID } from "node:crypto";
import { and, asc, eq, gte, inArray, lte, or, sql } from "drizzle-orm";
import { getDb } from "../../client";
import { jobs } from "../../schema";

export type ClaimedJob = {
  id: number;
  kind: string;
  payload: unknown;
  attempts: number;
  /** This claim's token: finishing, retrying and renewing the job need it. */
  leaseToken: string;
};

/**
 * Take up to `limit` due jobs of the given kinds for `leaseMs`: queued ones whose time has come,
 * and running ones whose worker let the lease run out (it died). A job whose lease ran out on its
 * last allowed attempt is given up (`failed`) instead: a job that kills its worker must not loop.
 * `SKIP LOCKED` lets several workers claim side by side without waiting on each other's rows.
 */
export async function claimJobs({
  kinds,
  limit,
  leaseMs,
  maxAttempts,
}: {
  kinds: string[];
  limit: number;
  leaseMs: number;
  maxAttempts: number;
}): Promise<ClaimedJob[]> {
  const now = sql`utc_timestamp(3)`;
  const expired = and(eq(jobs.status, "running"), lte(jobs.lockedUntil, now));
  return getDb().transaction(
    async (tx) => {
      await tx
        .update(jobs)
        .set({
          status: "failed",
          lockedUntil: null,
          leaseToken: null,
          lastError: sql`left(concat('its worker stopped during each of ', ${jobs.attempts}, ' attempts; last: ', coalesce(${jobs.lastError}, 'no error recorded')), 1000)`,
        })
        .where(and(inArray(jobs.kind, kinds), expired, gte(jobs.attempts, maxAttempts)));
      const due = await tx
        .select({ id: jobs.id, kind: jobs.kind, payload: jobs.payload, attempts: jobs.attempts })
        .from(jobs)
        .where(
          and(
            inArray(jobs.kind, kinds),
            or(and(eq(jobs.status, "queued"), lte(jobs.runAfter, now)), expired),
          ),
        )
        .orderBy(asc(jobs.id))
        .limit(limit)
        .for("update", { skipLocked: true });
      if (due.length === 0) return [];
      const leaseToken = randomUUID();
      await tx
        .update(jobs)
        .set({
          status: "running",
          attempts: sql`${jobs.attempts} + 1`,
          lockedUntil: sql`utc_timestamp(3) + interval ${Math.round(leaseMs * 1000)} microsecond`,
          leaseToken,
        })
        .where(
          inArray(
            jobs.id,
            due.map((j) => j.id),
          ),
        );
      return due.map((j) => ({ ...j, attempts: j.attempts + 1, leaseToken }));
    },
    { isolationLevel: "read committed" },
  );
}
