import "server-only";
import { clock } from "../clock";
import { recomputeVerdicts } from "../tech/recompute-verdicts";

/**
 * Re-derive, in one pass, the verdicts of every car a set of claimed recompute jobs of one event
 * names (forty phones' batches for one event become one pass, reading each car's records once
 * and the rule set once).
 */
export async function runRecomputeJobs(
  eventId: string,
  jobs: { entryIds: string[] }[],
): Promise<{ entries: number; mailsQueued: number }> {
  const entryIds = [...new Set(jobs.flatMap((j) => j.entryIds))];
  const result = await recomputeVerdicts({ eventId, entryIds, now: clock.now() });
  return { entries: entryIds.length, mailsQueued: result.mailsQueued };
}
