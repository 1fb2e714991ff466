// P6 (40 phones at once against one phone alone, with its physical floor) and P2b (batch stored
// → verdict visible to the entrant, under that burst), each repetition on fresh copies of the
// demo cars.

import type { Pool } from "mysql2/promise";
import type { HttpSession } from "../../tests/support/http-session";
import { BATCH_SIZE, type BenchSizes } from "./bench-options";
import { burstPhones } from "./burst-phones";
import { copyDemoEntries, removeCopies } from "./copy-demo-entries";
import { type Figure, type FigureRun, makeFigure } from "./figure";
import { type CpuPids, measureSinglePhone } from "./measure-single-phone";
import type { Phone, PhoneAnswer } from "./post-phone-batch";
import { processTreeCpuSeconds } from "./process-cpu-seconds";
import { percentile } from "./summarize";
import { waitForStoredVerdicts } from "./wait-for-stored-verdicts";
import { VERDICT_GIVE_UP_MS, VERDICT_POLL_MS, waitForVerdict } from "./wait-for-verdict";

export type Official = { session: HttpSession; officialId: string };

const storedBatch = (a: PhoneAnswer) => ({ entryIds: a.pendingEntryIds, receivedAt: a.receivedAt });

export async function benchPhoneBurst(opts: {
  databaseUrl: string;
  pool: Pool;
  eventId: string;
  officials: readonly Official[];
  entrantSession: (email: string) => Promise<HttpSession>;
  pids: CpuPids;
  cores: number;
  noWorkerReason: string | null;
  sizes: BenchSizes;
  log: (line: string) => void;
}): Promise<Figure[]> {
  const { sizes } = opts;
  const n = sizes.phones;
  const p6: FigureRun[] = [];
  const floor: FigureRun[] = [];
  const errorRuns: FigureRun[] = [];
  const p2b: FigureRun[] = [];
  let p2bNotMeasured: string | null = null;
  let p2bMode = "";
  for (let rep = 0; rep < sizes.repetitions; rep += 1) {
    const cars = await copyDemoEntries(opts.pool, opts.eventId, 2 * n);
    const emailOf = new Map(cars.map((c) => [c.entryId, c.driverEmail]));
    try {
      const phones: Phone[] = Array.from({ length: n }, (_, i) => {
        const official = opts.officials[i % opts.officials.length];
        if (!official) throw new Error("no official to sync as");
        return {
          ...official,
          deviceId: `bench-phone-${rep}-${i}`,
          entryIds: [cars[2 * i]?.entryId ?? "", cars[2 * i + 1]?.entryId ?? ""],
        };
      });
      const first = phones[0];
      if (!first) throw new Error("no phone");
      // The floor: one phone alone.
      const single = await measureSinglePhone({
        eventId: opts.eventId,
        phone: first,
        count: sizes.singlePhoneRequests,
        pool: opts.pool,
        pids: opts.pids,
      });
      const cpu = single.cpuPerRequest;
      const cpuAll = cpu.app + cpu.worker + cpu.mariadb;
      // N requests that each need c seconds of CPU cannot all be answered before N·c / cores.
      const floorAllMs = ((n * cpuAll) / opts.cores) * 1000;
      const floorAppMs = ((n * (cpu.app + cpu.worker)) / opts.cores) * 1000;

      // The burst, measured on its own (no verdict polling beside it). The app is one Node
      // thread: the CPU it spends on the burst is time the last answers must wait for, however
      // the work is ordered — the tightest floor, measured on the burst itself.
      const appCpuBefore = processTreeCpuSeconds(opts.pids.app);
      const burst = await burstPhones(opts.eventId, phones);
      const appCpuBurstMs = (processTreeCpuSeconds(opts.pids.app) - appCpuBefore) * 1000;
      const floorBurstP95Ms = 0.95 * appCpuBurstMs;
      const times = burst.answers.map((a) => a.ms);
      const failed = burst.answers.filter((a) => !a.ok);
      for (const f of failed.slice(0, 3)) opts.log(`P6 run ${rep + 1}: error ${f.problem}`);
      const p50 = percentile(times, 50);
      const p95 = percentile(times, 95);
      const max = Math.max(...times);
      await waitForStoredVerdicts(opts.pool, burst.answers.map(storedBatch));
      p6.push({
        value: p95 / single.p50Ms,
        detail: {
          burstP50Ms: Math.round(p50),
          burstP95Ms: Math.round(p95),
          burstMaxMs: Math.round(max),
          singleP50Ms: Math.round(single.p50Ms),
          errors: failed.length + single.errors,
        },
      });
      errorRuns.push({
        value: failed.length + single.errors,
        detail: { burstErrors: failed.length, singlePhoneErrors: single.errors },
      });
      floor.push({
        value: floorBurstP95Ms / single.p50Ms,
        detail: {
          appCpuDuringBurstMs: Math.round(appCpuBurstMs),
          floorP95MsFromBurst: Math.round(floorBurstP95Ms),
          floorRatioFromSinglePhoneCpu: Number((floorAllMs / single.p50Ms).toFixed(2)),
          cpuMsPerRequestApp: Number((cpu.app * 1000).toFixed(1)),
          cpuMsPerRequestWorker: Number((cpu.worker * 1000).toFixed(1)),
          cpuMsPerRequestMariadb: Number((cpu.mariadb * 1000).toFixed(1)),
          cores: opts.cores,
          floorP95Ms: Math.round(floorAllMs),
          floorP95MsAppOnly: Math.round(floorAppMs),
          floorRatioAppOnly: Number((floorAppMs / single.p50Ms).toFixed(2)),
          singleP50Ms: Math.round(single.p50Ms),
          singleCpuUtilisation: Number(
            ((cpuAll * sizes.singlePhoneRequests) / single.wallSeconds).toFixed(2),
          ),
        },
      });
      opts.log(
        `P6 run ${rep + 1}: ${n} phones p50 ${Math.round(p50)} ms, p95 ${Math.round(p95)} ms, max ${Math.round(max)} ms, ${failed.length} errors; one phone p50 ${Math.round(single.p50Ms)} ms; CPU/request app ${(cpu.app * 1000).toFixed(1)} ms, worker ${(cpu.worker * 1000).toFixed(1)} ms, MariaDB ${(cpu.mariadb * 1000).toFixed(1)} ms; app CPU during the burst ${Math.round(appCpuBurstMs)} ms → floor p95 ${Math.round(floorBurstP95Ms)} ms`,
      );

      // P2b: the same burst again, each phone polling its cars' verdicts as the entrant.
      const queued = burst.answers.some((a) => a.queued);
      if (queued && opts.noWorkerReason !== null) {
        p2bNotMeasured = `the sync queues verdicts (verdictsPending) and no worker runs: ${opts.noWorkerReason}`;
      } else if (p2bNotMeasured === null) {
        p2bMode = queued
          ? "queued: the worker recomputes"
          : "inline: the sync request recomputes (no worker)";
        const sessions = new Map<string, HttpSession>();
        for (const email of new Set(emailOf.values()))
          sessions.set(email, await opts.entrantSession(email));
        const watched = await burstPhones(opts.eventId, phones, (entryId, answer) => {
          const session = sessions.get(emailOf.get(entryId) ?? "");
          if (!session || answer.receivedAt === null) return Promise.resolve(null);
          return waitForVerdict({
            session,
            entryId,
            receivedAt: answer.receivedAt,
            answeredAt: answer.answeredAt,
          });
        });
        // A batch the server failed to take is an error (counted under P6 errors), not a miss.
        const taken = watched.visibleMs.filter((_, i) => watched.answers[i]?.ok);
        const visible = taken.map((v) => (v === null ? Number.POSITIVE_INFINITY : v));
        const misses = taken.filter((v) => v === null).length;
        const burstErrors = watched.answers.filter((a) => !a.ok);
        for (const f of burstErrors.slice(0, 3)) opts.log(`P2b run ${rep + 1}: error ${f.problem}`);
        const lastErrors = errorRuns.at(-1);
        if (lastErrors) {
          lastErrors.value += burstErrors.length;
          lastErrors.detail.p2bBurstErrors = burstErrors.length;
        }
        const p95Visible = percentile(visible, 95);
        p2b.push({
          value: p95Visible / 1000,
          detail: {
            p50Ms: Math.round(percentile(visible, 50)),
            p95Ms: Number.isFinite(p95Visible) ? Math.round(p95Visible) : "miss",
            maxMs: Number.isFinite(Math.max(...visible))
              ? Math.round(Math.max(...visible))
              : "miss",
            misses,
            burstErrors: burstErrors.length,
            mode: p2bMode,
          },
        });
        opts.log(
          `P2b run ${rep + 1} (${p2bMode}): visible p50 ${Math.round(percentile(visible, 50))} ms, p95 ${Number.isFinite(p95Visible) ? `${Math.round(p95Visible)} ms` : "miss"}, ${misses} misses`,
        );
        await waitForStoredVerdicts(opts.pool, watched.answers.map(storedBatch));
      }
    } finally {
      await removeCopies(opts.databaseUrl, cars);
    }
  }
  const burstWords = `${n} phones post one batch of ${BATCH_SIZE} records each at the same moment (distinct device ids, 2 demo cars each, fresh records)`;
  return [
    makeFigure(
      {
        id: "P6",
        label: `p95 ${n} phones/p50 one phone`,
        unit: "ratio",
        target: { op: "≤", value: 3 },
        definition: `${burstWords}: p95 latency ÷ the p50 of one phone sending ${sizes.singlePhoneRequests} batches one after another`,
      },
      p6,
    ),
    makeFigure(
      {
        id: "P6 floor",
        label: "0.95·app CPU of burst ÷ p50 one phone",
        unit: "ratio",
        target: null,
        definition: `the least P6 this server could show here: the app is one Node thread, so the 95th of ${n} answers cannot come before 95 % of the CPU time the app spent on the burst (read from /proc during the burst) has passed; ÷ the one-phone p50. Above 3, the P6 target is below the floor; the single-phone estimate (${n} × CPU per request of app + worker + MariaDB ÷ ${opts.cores} cores) is kept in the details`,
      },
      floor,
    ),
    makeFigure(
      {
        id: "P6 errors",
        label: "failed requests or records",
        unit: "count",
        target: { op: "≤", value: 0 },
        definition:
          "sync answers that were not 200, or records not stored, in the bursts (P6's and P2b's) and the single-phone run (must be 0)",
      },
      errorRuns,
    ),
    makeFigure(
      {
        id: "P2b",
        label: "stored → verdict visible p95",
        unit: "s",
        target: { op: "≤", value: 1 },
        definition: `the same burst again: from each phone's sync answer, GET /api/entries/<id>/verdict as the car's entrant (its driver's demo account) every ${VERDICT_POLL_MS} ms until computedAt ≥ the batch's receivedAt, for both its cars; p95 over the phones, a phone that waits over ${VERDICT_GIVE_UP_MS / 1000} s is a miss (counted as infinite)${p2bMode ? `; mode ${p2bMode}` : ""}`,
      },
      p2b,
      p2bNotMeasured,
    ),
  ];
}
