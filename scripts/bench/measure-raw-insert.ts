// P2's floor: the same records written straight into MariaDB's records table with one multi-row
// INSERT per batch through mysql2, as many in flight at once as the sync figure had requests.
import type { Pool } from "mysql2/promise";
import { makeSyncBatch } from "./make-sync-batch";

export type RawInsertResult = { recordsPerSecond: number; rows: number; seconds: number };

/** Insert `batches` batches of fresh records (new ids) for `cars`, `concurrency` at a time. */
export async function measureRawInsert(opts: {
  pool: Pool;
  eventId: string;
  officialId: string;
  cars: readonly string[];
  batches: number;
  concurrency: number;
}): Promise<RawInsertResult> {
  let next = 0;
  let rows = 0;
  const insertOne = async (k: number) => {
    const deviceId = `bench-p2-raw-${k % opts.concurrency}`;
    const first = (2 * k) % opts.cars.length;
    const entryIds = [opts.cars[first], opts.cars[(first + 1) % opts.cars.length]].filter(
      (id): id is string => id !== undefined,
    );
    const receivedAt = new Date();
    const values = makeSyncBatch({ entryIds, officialId: opts.officialId, deviceId }).map((r) => [
      r.id,
      opts.eventId,
      r.entryId,
      r.kind,
      JSON.stringify(r.payload),
      r.officialId,
      r.deviceId,
      new Date(r.deviceTime),
      receivedAt,
    ]);
    await opts.pool.query(
      `insert into records
        (id, event_id, entry_id, kind, payload, official_id, device_id, device_time, received_at)
        values ?`,
      [values],
    );
    rows += values.length;
  };
  const started = performance.now();
  await Promise.all(
    Array.from({ length: opts.concurrency }, async () => {
      for (let k = next++; k < opts.batches; k = next++) await insertOne(k);
    }),
  );
  const seconds = (performance.now() - started) / 1000;
  return { recordsPerSecond: rows / seconds, rows, seconds };
}
