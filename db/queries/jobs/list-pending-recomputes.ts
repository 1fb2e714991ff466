import "server-only";
import { and, eq, inArray } from "drizzle-orm";
import { recomputeVerdictsPayload } from "../../../lib/jobs/job-kinds";
import { getDb } from "../../client";
import { jobs } from "../../schema";

/**
 * The entries of an event whose verdict a queued or running recompute job will re-derive: their
 * stored verdict may not count every record yet. Read it before the verdicts: an entry not listed
 * then had every job committed so far done, so the verdicts read after it count those records.
 */
export async function listPendingRecomputes({ eventId }: { eventId: string }): Promise<string[]> {
  const open = await getDb()
    .select({ payload: jobs.payload })
    .from(jobs)
    .where(and(inArray(jobs.status, ["queued", "running"]), eq(jobs.kind, "recompute-verdicts")));
  const pending = new Set<string>();
  for (const { payload } of open) {
    const parsed = recomputeVerdictsPayload.safeParse(payload);
    if (parsed.success && parsed.data.eventId === eventId)
      for (const id of parsed.data.entryIds) pending.add(id);
  }
  return [...pending].sort();
}
