// P2: records per second accepted by the sync route ÷ records per second a raw multi-row INSERT
// of the same rows reaches in the same MariaDB, same batch size and concurrency, each repetition
// on fresh copies of the demo cars.
import type { Pool } from "mysql2/promise";
import type { HttpSession } from "../../tests/support/http-session";
import { BATCH_SIZE, type BenchSizes } from "./bench-options";
import { copyDemoEntries, removeCopies } from "./copy-demo-entries";
import { type Figure, type FigureRun, makeFigure } from "./figure";
import { measureRawInsert } from "./measure-raw-insert";
import { measureSyncThroughput } from "./measure-sync-throughput";
import { waitForStoredVerdicts } from "./wait-for-stored-verdicts";

export async function benchSyncAcceptance(opts: {
  appUrl: string;
  databaseUrl: string;
  pool: Pool;
  eventId: string;
  session: HttpSession;
  officialId: string;
  sizes: BenchSizes;
  /** The worker's pid: paused while the sync is timed, so P2 is the request path alone. */
  workerPid: number | null;
  log: (line: string) => void;
}): Promise<Figure> {
  const { sizes } = opts;
  const runs: FigureRun[] = [];
  for (let rep = 0; rep < sizes.repetitions; rep += 1) {
    const cars = await copyDemoEntries(
      opts.pool,
      opts.eventId,
      Math.min(80, 2 * sizes.syncBatches),
    );
    const entryIds = cars.map((c) => c.entryId);
    try {
      const common = {
        eventId: opts.eventId,
        officialId: opts.officialId,
        cars: entryIds,
        batches: sizes.syncBatches,
        concurrency: sizes.syncConcurrency,
      };
      // P2 is what the request path costs (validate, store, queue): the worker is paused
      // (SIGSTOP) while it is timed — its own cost is P2b's and P3's — and goes on after.
      const paused = async <T>(work: () => Promise<T>): Promise<T> => {
        if (opts.workerPid !== null) process.kill(opts.workerPid, "SIGSTOP");
        try {
          return await work();
        } finally {
          if (opts.workerPid !== null) process.kill(opts.workerPid, "SIGCONT");
        }
      };
      const sync = async () => {
        const result = await paused(() =>
          measureSyncThroughput({ ...common, appUrl: opts.appUrl, session: opts.session }),
        );
        // Let queued recomputes finish before the floor runs beside them or the cars go.
        await waitForStoredVerdicts(opts.pool, result.stored);
        return result;
      };
      // The cost of a request as such: the same route with one record a batch.
      const single = async () => {
        const result = await paused(() =>
          measureSyncThroughput({
            ...common,
            appUrl: opts.appUrl,
            session: opts.session,
            batchSize: 1,
          }),
        );
        await waitForStoredVerdicts(opts.pool, result.stored);
        return result;
      };
      const raw = () => measureRawInsert({ ...common, pool: opts.pool });
      // Alternate which goes first, so a machine that warms up or slows down favours neither.
      let s: Awaited<ReturnType<typeof sync>>;
      let r: Awaited<ReturnType<typeof raw>>;
      if (rep % 2 === 0) {
        s = await sync();
        r = await raw();
      } else {
        r = await raw();
        s = await sync();
      }
      const one = await single();
      // Time per request at this concurrency: with one record, almost all of it is the request
      // (HTTP, session, guard, transaction); what 50 records add on top is their own cost.
      const msPerRequest = (1000 * one.seconds) / Math.max(1, one.requests);
      const msPerBatch = (1000 * s.seconds) / Math.max(1, s.requests);
      const msPerRecord = (msPerBatch - msPerRequest) / (BATCH_SIZE - 1);
      if (s.errors > 0) opts.log(`P2 run ${rep + 1}: ${s.errors} sync requests or records FAILED`);
      runs.push({
        value: s.recordsPerSecond / r.recordsPerSecond,
        detail: {
          syncRecordsPerSecond: Math.round(s.recordsPerSecond),
          rawInsertRecordsPerSecond: Math.round(r.recordsPerSecond),
          syncSeconds: Number(s.seconds.toFixed(2)),
          rawInsertSeconds: Number(r.seconds.toFixed(2)),
          storedRecords: s.storedRecords,
          syncErrors: s.errors + one.errors,
          msPerOneRecordRequest: Number(msPerRequest.toFixed(2)),
          msPerBatch: Number(msPerBatch.toFixed(2)),
          msPerExtraRecord: Number(msPerRecord.toFixed(3)),
          rawMsPerBatch: Number(((1000 * r.seconds) / sizes.syncBatches).toFixed(2)),
        },
      });
      opts.log(
        `P2 run ${rep + 1}: sync ${Math.round(s.recordsPerSecond)} records/s, raw INSERT ${Math.round(r.recordsPerSecond)} records/s; a batch ${msPerBatch.toFixed(1)} ms = a 1-record request ${msPerRequest.toFixed(1)} ms + ${msPerRecord.toFixed(2)} ms per further record (raw INSERT ${((1000 * r.seconds) / sizes.syncBatches).toFixed(1)} ms a batch)`,
      );
    } finally {
      await removeCopies(opts.databaseUrl, cars);
    }
  }
  return makeFigure(
    {
      id: "P2",
      label: "sync/raw insert",
      unit: "ratio",
      target: { op: "≥", value: 0.5 },
      definition: `records/s through POST /api/events/<id>/sync (signed in as a demo scrutineer; ${BATCH_SIZE} records a batch over 2 cars; ${sizes.syncBatches} batches, ${sizes.syncConcurrency} in flight through fetch; the worker paused meanwhile, so this is the request path alone) ÷ records/s of one multi-row INSERT per batch of the same rows into the same records table through mysql2 (same batch size and concurrency)`,
    },
    runs,
  );
}
