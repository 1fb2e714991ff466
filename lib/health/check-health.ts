import "server-only";
import { countOpenJobs } from "../../db/queries/jobs/count-open-jobs";
import { pingDatabase } from "../../db/queries/ping-database";
import { getMailTransport } from "../mail/mail-transport";

export type HealthReport = {
  ok: boolean;
  checks: {
    database: { ok: boolean; detail: string };
    mail: { ok: boolean; detail: string };
    jobs: { ok: boolean; detail: string };
  };
};

async function timed<T>(work: Promise<T>, ms: number): Promise<T> {
  let timer: ReturnType<typeof setTimeout> | undefined;
  const timeout = new Promise<never>((_, reject) => {
    timer = setTimeout(() => reject(new Error(`no answer within ${ms} ms`)), ms);
  });
  try {
    return await Promise.race([work, timeout]);
  } finally {
    clearTimeout(timer);
  }
}

/** A job waiting longer than this means no worker is keeping up (or none runs). */
const JOB_WAIT_LIMIT_SECONDS = 300;

/**
 * Can the app reach its database and its mail server right now, and is the job worker keeping
 * up (no job waiting over five minutes, none given up)?
 */
export async function checkHealth(): Promise<HealthReport> {
  const [database, mail, jobs] = await Promise.allSettled([
    timed(pingDatabase(), 3000),
    timed(getMailTransport().verify(), 3000),
    timed(countOpenJobs(), 3000),
  ]);
  const checks = {
    database:
      database.status === "fulfilled"
        ? { ok: true, detail: `reachable, ${database.value.migrations} migrations applied` }
        : { ok: false, detail: `database unreachable: ${reason(database.reason)}` },
    mail:
      mail.status === "fulfilled"
        ? { ok: true, detail: "SMTP server answered" }
        : { ok: false, detail: `mail server unreachable: ${reason(mail.reason)}` },
    jobs:
      jobs.status === "fulfilled"
        ? {
            ok: jobs.value.oldestSeconds <= JOB_WAIT_LIMIT_SECONDS && jobs.value.failed === 0,
            detail: `${jobs.value.open} waiting (oldest ${jobs.value.oldestSeconds} s), ${jobs.value.failed} given up${jobs.value.oldestSeconds > JOB_WAIT_LIMIT_SECONDS ? ": is the worker running? (npm run worker)" : ""}${jobs.value.failed > 0 ? ": see jobs.last_error, mend the cause, then npm run jobs:retry-failed" : ""}`,
          }
        : { ok: false, detail: `job queue unreadable: ${reason(jobs.reason)}` },
  };
  return { ok: checks.database.ok && checks.mail.ok && checks.jobs.ok, checks };
}

function reason(error: unknown): string {
  if (error instanceof Error) return (error as Error & { code?: string }).code ?? error.message;
  return String(error);
}
