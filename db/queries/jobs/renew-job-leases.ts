import "server-only";
import { and, eq, inArray, sql } from "drizzle-orm";
import { getDb } from "../../client";
import { jobs } from "../../schema";

/** Extend the lease of jobs a worker is still working on, so no other worker takes them. */
export async function renewJobLeases({ ids, leaseMs }: { ids: number[]; leaseMs: number }) {
  if (ids.length === 0) return;
  await getDb()
    .update(jobs)
    .set({
      lockedUntil: sql`utc_timestamp(3) + interval ${Math.round(leaseMs * 1000)} microsecond`,
    })
    .where(and(inArray(jobs.id, ids), eq(jobs.status, "running")));
}
