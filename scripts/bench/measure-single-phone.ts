// P6's floor: one phone alone, sending its batches one after another. Gives the p50 a lone
// request gets and the CPU time the server spends on one request (app, worker and MariaDB).
import type { Pool } from "mysql2/promise";
import { type Phone, postPhoneBatch } from "./post-phone-batch";
import { processTreeCpuSeconds } from "./process-cpu-seconds";
import { percentile } from "./summarize";
import { type StoredBatch, waitForStoredVerdicts } from "./wait-for-stored-verdicts";

export type CpuPids = { app: number; worker: number | null; mariadb: number | null };

export type SinglePhoneResult = {
  p50Ms: number;
  errors: number;
  /** CPU seconds per request, by process (the worker's and MariaDB's are 0 when not seen). */
  cpuPerRequest: { app: number; worker: number; mariadb: number };
  /** Wall seconds the whole run took (CPU ÷ wall is the utilisation). */
  wallSeconds: number;
};

function cpuNow(pids: CpuPids) {
  return {
    app: processTreeCpuSeconds(pids.app),
    worker: pids.worker === null ? 0 : processTreeCpuSeconds(pids.worker),
    mariadb: pids.mariadb === null ? 0 : processTreeCpuSeconds(pids.mariadb),
  };
}

/**
 * `count` batches from one phone, each sent when the last one's answer is in. The CPU is read
 * once the verdicts of its cars have been recomputed, so a worker's share is counted too.
 * MariaDB's CPU is the whole server's: another program using it at the time adds to it.
 */
export async function measureSinglePhone(opts: {
  eventId: string;
  phone: Phone;
  count: number;
  pool: Pool;
  pids: CpuPids;
}): Promise<SinglePhoneResult> {
  const before = cpuNow(opts.pids);
  const started = performance.now();
  const times: number[] = [];
  let errors = 0;
  const stored: StoredBatch[] = [];
  for (let i = 0; i < opts.count; i += 1) {
    const answer = await postPhoneBatch(opts.eventId, opts.phone);
    times.push(answer.ms);
    if (!answer.ok) errors += 1;
    stored.push({ entryIds: answer.pendingEntryIds, receivedAt: answer.receivedAt });
  }
  await waitForStoredVerdicts(opts.pool, stored);
  const wallSeconds = (performance.now() - started) / 1000;
  const after = cpuNow(opts.pids);
  return {
    p50Ms: percentile(times, 50),
    errors,
    cpuPerRequest: {
      app: (after.app - before.app) / opts.count,
      worker: (after.worker - before.worker) / opts.count,
      mariadb: (after.mariadb - before.mariadb) / opts.count,
    },
    wallSeconds,
  };
}
