import "server-only";
import { and, asc, eq, inArray, lte, or, sql } from "drizzle-orm";
import { getDb } from "../../client";
import { jobs } from "../../schema";

export type ClaimedJob = { id: number; kind: string; payload: unknown; attempts: number };

/**
 * Take up to `limit` due jobs of the given kinds for `leaseMs`: queued ones whose time has come,
 * and running ones whose worker let the lease run out (it died). `SKIP LOCKED` lets several
 * workers claim side by side without waiting on each other's rows.
 */
export async function claimJobs({
  kinds,
  limit,
  leaseMs,
}: {
  kinds: string[];
  limit: number;
  leaseMs: number;
}): Promise<ClaimedJob[]> {
  return getDb().transaction(
    async (tx) => {
      const due = await tx
        .select({ id: jobs.id, kind: jobs.kind, payload: jobs.payload, attempts: jobs.attempts })
        .from(jobs)
        .where(
          and(
            inArray(jobs.kind, kinds),
            or(
              and(eq(jobs.status, "queued"), lte(jobs.runAfter, sql`utc_timestamp(3)`)),
              and(eq(jobs.status, "running"), lte(jobs.lockedUntil, sql`utc_timestamp(3)`)),
            ),
          ),
        )
        .orderBy(asc(jobs.id))
        .limit(limit)
        .for("update", { skipLocked: true });
      if (due.length === 0) return [];
      await tx
        .update(jobs)
        .set({
          status: "running",
          attempts: sql`${jobs.attempts} + 1`,
          lockedUntil: sql`utc_timestamp(3) + interval ${Math.round(leaseMs * 1000)} microsecond`,
        })
        .where(
          inArray(
            jobs.id,
            due.map((j) => j.id),
          ),
        );
      return due.map((j) => ({ ...j, attempts: j.attempts + 1 }));
    },
    { isolationLevel: "read committed" },
  );
}
