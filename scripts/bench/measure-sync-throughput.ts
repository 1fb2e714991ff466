// P2's figure: records per second accepted through POST /api/events/<id>/sync, with `concurrency`
// requests in flight (each lane posts its next batch when its answer is in), through fetch
// (undici: keep-alive, no Nagle delay). autocannon was tried first: its requests waited on TCP's
// delayed acknowledgement (every batch took 1/60 s however fast the server was), which measured
// the client, not the server.
import type { HttpSession } from "../../tests/support/http-session";
import { makeSyncBatch, syncBody } from "./make-sync-batch";
import type { StoredBatch } from "./wait-for-stored-verdicts";

export type ThroughputResult = {
  recordsPerSecond: number;
  requests: number;
  storedRecords: number;
  /** Each answered batch's cars and receive time. */
  stored: StoredBatch[];
  /** Requests that were not 200, or records in a 200 answer that were not stored. */
  errors: number;
  seconds: number;
};

/**
 * Post `batches` sync batches with `concurrency` requests in flight, as `session` (whose user
 * makes the records), each batch over two of `cars` in turn. Bodies are built before the clock
 * starts.
 */
export async function measureSyncThroughput(opts: {
  appUrl: string;
  eventId: string;
  session: HttpSession;
  officialId: string;
  cars: readonly string[];
  batches: number;
  concurrency: number;
  /** Records in a batch (the phones' 50 unless given). */
  batchSize?: number;
}): Promise<ThroughputResult> {
  const bodies = Array.from({ length: opts.batches }, (_, k) => {
    const deviceId = `bench-p2-${k % opts.concurrency}`;
    const first = (2 * k) % opts.cars.length;
    const entryIds = [opts.cars[first], opts.cars[(first + 1) % opts.cars.length]].filter(
      (id): id is string => id !== undefined,
    );
    const records = makeSyncBatch({
      entryIds,
      officialId: opts.officialId,
      deviceId,
      size: opts.batchSize,
    });
    return { entryIds, body: syncBody(deviceId, records) };
  });
  let next = 0;
  let storedRecords = 0;
  let errors = 0;
  const stored: StoredBatch[] = [];
  const lane = async () => {
    for (let k = next++; k < bodies.length; k = next++) {
      const batch = bodies[k];
      if (!batch) break;
      const response = await opts.session.fetch(`/api/events/${opts.eventId}/sync`, {
        method: "POST",
        headers: { "content-type": "application/json" },
        body: batch.body,
      });
      const text = await response.text();
      if (response.status !== 200) {
        errors += 1;
        continue;
      }
      const answer = JSON.parse(text) as {
        results: { status: string }[];
        receivedAt: string;
        verdictsPending?: string[];
      };
      stored.push({
        entryIds: answer.verdictsPending ?? batch.entryIds,
        receivedAt: answer.receivedAt,
      });
      const storedHere = answer.results.filter((r) => r.status === "stored").length;
      storedRecords += storedHere;
      errors += answer.results.length - storedHere;
    }
  };
  const started = performance.now();
  await Promise.all(Array.from({ length: opts.concurrency }, lane));
  const seconds = (performance.now() - started) / 1000;
  return {
    recordsPerSecond: storedRecords / seconds,
    requests: bodies.length,
    storedRecords,
    stored,
    errors,
    seconds,
  };
}
