// P2's figure: records per second accepted through POST /api/events/<id>/sync, with autocannon.
// Each request needs fresh record ids, which autocannon's setupRequest makes per request.
import autocannon from "autocannon";
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
 * makes the records), each batch over two of `cars` in turn.
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
  let made = 0;
  let storedRecords = 0;
  let errors = 0;
  const stored: StoredBatch[] = [];
  const started = performance.now();
  const result = await autocannon({
    url: `${opts.appUrl}/api/events/${opts.eventId}/sync`,
    method: "POST",
    connections: opts.concurrency,
    amount: opts.batches,
    timeout: 60,
    headers: { "content-type": "application/json", cookie: opts.session.cookieHeader() },
    requests: [
      {
        setupRequest: (request, context) => {
          const k = made++;
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
          // One request in flight per connection: its context carries the batch's cars.
          (context as { entryIds?: string[] }).entryIds = entryIds;
          return { ...request, body: syncBody(deviceId, records) };
        },
        onResponse: (status, body, context) => {
          if (status !== 200) {
            errors += 1;
            return;
          }
          const answer = JSON.parse(body) as {
            results: { status: string }[];
            receivedAt: string;
            verdictsPending?: string[];
          };
          stored.push({
            entryIds: answer.verdictsPending ?? (context as { entryIds?: string[] }).entryIds ?? [],
            receivedAt: answer.receivedAt,
          });
          const storedHere = answer.results.filter((r) => r.status === "stored").length;
          storedRecords += storedHere;
          errors += answer.results.length - storedHere;
        },
      },
    ],
  });
  const seconds = (performance.now() - started) / 1000;
  errors += result.errors;
  return {
    recordsPerSecond: storedRecords / seconds,
    requests: result.requests.total,
    storedRecords,
    stored,
    errors,
    seconds,
  };
}
