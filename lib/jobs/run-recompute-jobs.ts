import "server-only";
import { clock } from "../clock";
import { recomputeVerdicts } from "../tech/recompute-verdicts";
import { recomputeVerdictsPayload } from "./job-kinds";

/**
 * Re-derive the verdicts a set of claimed recompute jobs asks for, merged: one recompute per
 * event over every entry any of its jobs names (forty phones' batches for one event become one
 * pass, reading each entry's records once and the rule set once).
 */
export async function runRecomputeJobs(
  jobs: { id: number; payload: unknown }[],
): Promise<{ entries: number; mailsQueued: number }> {
  const byEvent = new Map<string, Set<string>>();
  for (const job of jobs) {
    const { eventId, entryIds } = recomputeVerdictsPayload.parse(job.payload);
    const set = byEvent.get(eventId) ?? new Set<string>();
    for (const id of entryIds) set.add(id);
    byEvent.set(eventId, set);
  }
  let entries = 0;
  let mailsQueued = 0;
  for (const [eventId, entryIds] of byEvent) {
    const result = await recomputeVerdicts({ eventId, entryIds: [...entryIds], now: clock.now() });
    entries += entryIds.size;
    mailsQueued += result.mailsQueued;
  }
  return { entries, mailsQueued };
}
