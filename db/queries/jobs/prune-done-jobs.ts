import "server-only";
import { and, eq, sql } from "drizzle-orm";
import { getDb } from "../../client";
import { jobs } from "../../schema";

/** Delete jobs finished more than `days` ago (their effects are in their own tables). */
export async function pruneDoneJobs({ days }: { days: number }): Promise<number> {
  const [result] = await getDb()
    .delete(jobs)
    .where(
      and(eq(jobs.status, "done"), sql`${jobs.doneAt} < utc_timestamp(3) - interval ${days} day`),
    );
  return result.affectedRows;
}
