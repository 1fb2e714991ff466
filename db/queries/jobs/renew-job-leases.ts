import "server-only";
import { and, eq, inArray, sql } from "drizzle-orm";
import { getDb } from "../../client";
import { jobs } from "../../schema";

/**
 * Extend the lease of jobs this claim still holds, so no other worker takes them. Returns how
 * many it extended: fewer than asked means another worker has taken some back.
 */
export async function renewJobLeases({
  ids,
  leaseToken,
  leaseMs,
}: {
  ids: number[];
  leaseToken: string;
  leaseMs: number;
}): Promise<number> {
  if (ids.length === 0) return 0;
  const [result] = await getDb()
    .update(jobs)
    .set({
      lockedUntil: sql`utc_timestamp(3) + interval ${Math.round(leaseMs * 1000)} microsecond`,
    })
    .where(and(inArray(jobs.id, ids), eq(jobs.status, "running"), eq(jobs.leaseToken, leaseToken)));
  return result.affectedRows;
}
