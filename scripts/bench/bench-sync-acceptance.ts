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
      const sync = async () => {
        const result = await measureSyncThroughput({
          ...common,
          appUrl: opts.appUrl,
          session: opts.session,
        });
        // Let queued recomputes finish before the floor runs beside them or the cars go.
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
      if (s.errors > 0) opts.log(`P2 run ${rep + 1}: ${s.errors} sync requests or records FAILED`);
      runs.push({
        value: s.recordsPerSecond / r.recordsPerSecond,
        detail: {
          syncRecordsPerSecond: Math.round(s.recordsPerSecond),
          rawInsertRecordsPerSecond: Math.round(r.recordsPerSecond),
          syncSeconds: Number(s.seconds.toFixed(2)),
          rawInsertSeconds: Number(r.seconds.toFixed(2)),
          storedRecords: s.storedRecords,
          syncErrors: s.errors,
        },
      });
      opts.log(
        `P2 run ${rep + 1}: sync ${Math.round(s.recordsPerSecond)} records/s, raw INSERT ${Math.round(r.recordsPerSecond)} records/s`,
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
      definition: `records/s through POST /api/events/<id>/sync (signed in as a demo scrutineer; ${BATCH_SIZE} records a batch over 2 cars; ${sizes.syncBatches} batches, ${sizes.syncConcurrency} in flight, autocannon) ÷ records/s of one multi-row INSERT per batch of the same rows into the same records table through mysql2 (same batch size and concurrency)`,
    },
    runs,
  );
}
