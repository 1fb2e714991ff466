import "server-only";
import { type ClaimedJob, claimJobs } from "../../db/queries/jobs/claim-jobs";
import { finishJobs } from "../../db/queries/jobs/finish-jobs";
import { pruneDoneJobs } from "../../db/queries/jobs/prune-done-jobs";
import { renewJobLeases } from "../../db/queries/jobs/renew-job-leases";
import { retryJobs } from "../../db/queries/jobs/retry-jobs";
import { faultPoint } from "./fault-point";
import { jobBackoffMs, maxAttempts } from "./job-backoff";
import { RECOMPUTE_VERDICTS, recomputeVerdictsPayload, SEND_MAIL } from "./job-kinds";
import { runMailJob } from "./run-mail-job";
import { runRecomputeJobs } from "./run-recompute-jobs";

/** Recompute jobs merged into one pass at most; mails sent side by side at most. */
const RECOMPUTE_BATCH = 100;
const MAIL_BATCH = 6;
const PRUNE_EVERY_MS = 3_600_000;
const DONE_JOBS_KEPT_DAYS = 7;

export type WorkQueueOptions = {
  leaseMs: number;
  pollMs: number;
  /** Resolves when the worker should stop (after finishing what it holds). */
  stopped: Promise<void>;
  log?: (line: string) => void;
};

/**
 * The worker's loop: claim due jobs, run them, mark them done — or put them back with backoff.
 * Verdict recomputes go first (the tech line waits on them), merged per event, each event on its
 * own (one event's failure holds up no other); mails follow. A job is held under a lease renewed
 * while it runs; a worker that dies leaves the lease to run out and another (or the same,
 * restarted) takes the job again, so every handler is idempotent.
 */
export async function workQueue({ leaseMs, pollMs, stopped, log = console.log }: WorkQueueOptions) {
  let stopping = false;
  void stopped.then(() => {
    stopping = true;
  });
  let lastPrune = 0;
  while (!stopping) {
    if (Date.now() - lastPrune > PRUNE_EVERY_MS) {
      lastPrune = Date.now();
      const pruned = await pruneDoneJobs({ days: DONE_JOBS_KEPT_DAYS }).catch(() => 0);
      if (pruned > 0) log(`[worker] pruned ${pruned} finished jobs`);
    }
    let worked = 0;
    try {
      const recompute = await claimJobs({
        kinds: [RECOMPUTE_VERDICTS],
        limit: RECOMPUTE_BATCH,
        leaseMs,
        maxAttempts: maxAttempts(RECOMPUTE_VERDICTS),
      });
      worked += recompute.length;
      for (const [eventId, group] of byEvent(recompute)) {
        await holding(
          group.map((g) => g.job),
          leaseMs,
          async () => {
            if (eventId === null) throw new Error("the job's payload does not name an event");
            const done = await runRecomputeJobs(
              eventId,
              group.map((g) => ({ entryIds: g.entryIds })),
            );
            faultPoint("worker:recomputed");
            log(
              `[worker] ${group.length} recompute job(s) of event ${eventId}: ${done.entries} entries, ${done.mailsQueued} mail(s) queued`,
            );
          },
        );
      }
      const mails = await claimJobs({
        kinds: [SEND_MAIL],
        limit: MAIL_BATCH,
        leaseMs,
        maxAttempts: maxAttempts(SEND_MAIL),
      });
      worked += mails.length;
      await Promise.all(mails.map((job) => holding([job], leaseMs, () => runMailJob(job))));
    } catch (error) {
      // The database is away (restarting) or a claim failed: wait and try again.
      log(`[worker] could not reach the queue: ${errorText(error)}`);
      await sleep(Math.max(pollMs, 1000), stopped);
      continue;
    }
    if (worked === 0) await sleep(pollMs, stopped);
  }
}

/** Claimed recompute jobs by event; a payload that does not read goes alone, under `null`. */
function byEvent(jobs: ClaimedJob[]) {
  const groups = new Map<string | null, { job: ClaimedJob; entryIds: string[] }[]>();
  for (const job of jobs) {
    const parsed = recomputeVerdictsPayload.safeParse(job.payload);
    const eventId = parsed.success ? parsed.data.eventId : null;
    const entryIds = parsed.success ? parsed.data.entryIds : [];
    groups.set(eventId, [...(groups.get(eventId) ?? []), { job, entryIds }]);
  }
  return groups;
}

/**
 * Run `work` for jobs of one claim with their lease renewed, then finish them, or put each back
 * after its own backoff — or give it up once it has had its attempts.
 */
async function holding(jobs: ClaimedJob[], leaseMs: number, work: () => Promise<unknown>) {
  const ids = jobs.map((j) => j.id);
  const leaseToken = jobs[0]?.leaseToken ?? "";
  const renew = setInterval(() => {
    void renewJobLeases({ ids, leaseToken, leaseMs }).catch(() => undefined);
  }, leaseMs / 3);
  try {
    await work();
  } catch (error) {
    clearInterval(renew);
    for (const job of jobs) {
      const giveUp = job.attempts >= maxAttempts(job.kind);
      console.error(
        `[worker] job ${job.id} (${job.kind}) failed, attempt ${job.attempts}${giveUp ? ", giving up" : ""}: ${errorText(error)}`,
      );
      await retryJobs({
        ids: [job.id],
        leaseToken,
        error: errorText(error),
        delayMs: jobBackoffMs(job.attempts, Math.random()),
        giveUp,
      });
    }
    return;
  }
  clearInterval(renew);
  await finishJobs({ ids, leaseToken });
}

function errorText(error: unknown): string {
  if (error instanceof Error) {
    const code = (error as Error & { code?: string; cause?: { code?: string } }).code;
    return `${code ? `${code}: ` : ""}${error.message}`.slice(0, 1000);
  }
  return String(error).slice(0, 1000);
}

function sleep(ms: number, stopped: Promise<void>): Promise<void> {
  return new Promise((resolve) => {
    const timer = setTimeout(resolve, ms);
    void stopped.then(() => {
      clearTimeout(timer);
      resolve();
    });
  });
}
