import "server-only";
import { inArray, sql } from "drizzle-orm";
import { getDb } from "../../client";
import { jobs } from "../../schema";

/** Jobs not finished yet, and how long the oldest has waited (seconds), by the database's clock. */
export async function countOpenJobs(): Promise<{
  open: number;
  failed: number;
  oldestSeconds: number;
}> {
  const [row] = await getDb()
    .select({
      open: sql<number>`sum(${jobs.status} in ('queued', 'running'))`,
      failed: sql<number>`sum(${jobs.status} = 'failed')`,
      oldestSeconds: sql<number>`coalesce(timestampdiff(second, min(case when ${jobs.status} in ('queued', 'running') then ${jobs.createdAt} end), utc_timestamp(3)), 0)`,
    })
    .from(jobs)
    .where(inArray(jobs.status, ["queued", "running", "failed"]));
  return {
    open: Number(row?.open ?? 0),
    failed: Number(row?.failed ?? 0),
    oldestSeconds: Number(row?.oldestSeconds ?? 0),
  };
}
