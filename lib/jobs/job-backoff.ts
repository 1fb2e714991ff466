import { SEND_MAIL } from "./job-kinds";

/**
 * Attempts before a job is given up and left `failed` for an official to see (and
 * `npm run jobs:retry-failed` to queue again). An e-mail keeps trying for about two hours — the
 * track's link to the internet may be down for a while — a recompute for eight attempts (it fails
 * only on a fault in the code or the data, which retrying does not mend).
 */
export function maxAttempts(kind: string): number {
  return kind === SEND_MAIL ? 30 : 8;
}

/**
 * Delay before attempt `attempts + 1` of a failed job: exponential from 1 s, capped at 5 min,
 * with "equal jitter" so jobs that failed together do not come back together. Source: AWS
 * Architecture Blog, "Exponential Backoff And Jitter" (2015), the equal-jitter variant.
 */
export function jobBackoffMs(attempts: number, random: number): number {
  const ceiling = Math.min(300_000, 1000 * 2 ** Math.max(0, attempts - 1));
  return Math.round(ceiling * (0.5 + random / 2));
}
