import { announceChange } from "./announce-change";
import type { PendingVerdicts } from "./await-fresh-verdicts";
import { backoffDelayMs } from "./backoff-delay";
import { listLocalRecords } from "./list-local-records";
import { isPending, type LocalRecord } from "./local-record";
import { OUTBOX_LOCK, SYNC_BATCH_SIZE } from "./outbox-constants";
import { resetOutboxBackoff } from "./reset-outbox-backoff";
import { updateLocalRecord } from "./update-local-record";
import { uploadPhoto } from "./upload-photo";

export type DrainSummary = {
  ran: boolean;
  sent: number;
  refused: number;
  waiting: number;
  signedOut: boolean;
  /** Per answered batch, the entries whose verdict the server's worker will recompute: the
   *  caller waits for them with `awaitFreshVerdicts` (the drain itself never waits). */
  verdictsPending: PendingVerdicts[];
};

type SyncAnswer = {
  results: (
    | { id: string; status: "stored" | "duplicate" }
    | { id: string | null; status: "refused"; reason: string }
  )[];
  /** Server time the batch was received (ISO 8601). */
  receivedAt?: string;
  /** Entries whose verdict the server will recompute; missing from an older server = none. */
  verdictsPending?: string[];
};

type Options = {
  now: () => number;
  random?: () => number;
  fetchImpl?: typeof fetch;
  onProgress?: (progress: { sent: number; total: number }) => void;
};

/**
 * Send the outbox: photos first, then records in batches, oldest first, one context at a time
 * (Web Locks). Stored and duplicate records are marked sent; refused ones keep their reason; with
 * no signal or a server error the batch waits with exponential backoff and jitter, until a request
 * goes through (then every queued record is due again); an expired sign-in keeps the queue until
 * the scrutineer signs in again. Nothing is dropped.
 */
export async function drainOutbox(options: Options): Promise<DrainSummary> {
  const locks =
    typeof navigator !== "undefined"
      ? (navigator as Navigator & { locks?: LockManager }).locks
      : undefined;
  if (!locks) return run(options);
  const result = await locks.request(OUTBOX_LOCK, { ifAvailable: true }, (lock) =>
    lock ? run(options) : Promise.resolve<DrainSummary | null>(null),
  );
  return (
    result ?? {
      ran: false,
      sent: 0,
      refused: 0,
      waiting: 0,
      signedOut: false,
      verdictsPending: [],
    }
  );
}

/** Passes over the outbox in one drain: a pass after a success sends what was waiting out a retry. */
const MAX_PASSES = 3;

async function run(options: Options): Promise<DrainSummary> {
  const summary: DrainSummary = {
    ran: true,
    sent: 0,
    refused: 0,
    waiting: 0,
    signedOut: false,
    verdictsPending: [],
  };
  for (let pass = 0; pass < MAX_PASSES; pass += 1) {
    const { madeDue } = await runPass(options, summary);
    if (madeDue === 0) break;
  }
  return summary;
}

/**
 * One pass over the records due now. The first request that goes through resets every queued
 * record's backoff (there is signal again); `madeDue` says how many that made due, for the next pass.
 */
async function runPass(
  { now, random = Math.random, fetchImpl = fetch, onProgress }: Options,
  summary: DrainSummary,
): Promise<{ madeDue: number }> {
  const due = (await listLocalRecords()).filter((r) => isPending(r) && r.nextAttemptAt <= now());
  let madeDue = 0;
  let reached = false;
  const signalIsBack = async () => {
    if (reached) return;
    reached = true;
    madeDue = await resetOutboxBackoff({ now: now() });
  };
  const total = due.length;
  const byEvent = new Map<string, LocalRecord[]>();
  for (const item of due) {
    const items = byEvent.get(item.eventId);
    if (items) items.push(item);
    else byEvent.set(item.eventId, [item]);
  }

  const later = async (items: LocalRecord[], error: string) => {
    for (const item of items) {
      const attempts = item.attempts + 1;
      await updateLocalRecord(item.record.id, (r) => ({
        ...r,
        state: "queued",
        attempts,
        lastError: error,
        nextAttemptAt: now() + backoffDelayMs(attempts, random()),
      }));
    }
    summary.waiting += items.length;
  };
  const holdForSignIn = async (items: LocalRecord[]) => {
    for (const item of items) {
      await updateLocalRecord(item.record.id, (r) => ({
        ...r,
        state: "needs-sign-in",
        lastError: "Sign in again to send.",
      }));
    }
    summary.signedOut = true;
    summary.waiting += items.length;
  };
  const refuse = async (item: LocalRecord, reason: string) => {
    await updateLocalRecord(item.record.id, (r) => ({ ...r, state: "refused", lastError: reason }));
    summary.refused += 1;
  };

  for (const [eventId, items] of byEvent) {
    const ready: LocalRecord[] = [];
    for (const item of items) {
      if (item.blob !== "waiting") {
        ready.push(item);
        continue;
      }
      const outcome = await uploadPhoto(item, fetchImpl);
      if (outcome === "uploaded") {
        await updateLocalRecord(item.record.id, (r) => ({ ...r, blob: "uploaded" }));
        await signalIsBack();
        ready.push({ ...item, blob: "uploaded" });
      } else if (outcome === "signed-out") {
        await holdForSignIn([item]);
      } else if (outcome === "retry") {
        await later([item], "No signal for the photo; will try again.");
      } else {
        await refuse(item, outcome.refused);
      }
    }

    for (let start = 0; start < ready.length; start += SYNC_BATCH_SIZE) {
      const batch = ready.slice(start, start + SYNC_BATCH_SIZE);
      for (const item of batch)
        await updateLocalRecord(item.record.id, (r) => ({ ...r, state: "sending" }));
      announceChange({ type: "records", eventId });
      let response: Response;
      try {
        response = await fetchImpl(`/api/events/${eventId}/sync`, {
          method: "POST",
          headers: { "content-type": "application/json" },
          credentials: "same-origin",
          body: JSON.stringify({
            deviceId: batch[0]?.record.deviceId ?? "unknown",
            records: batch.map((b) => b.record),
          }),
        });
      } catch {
        await later(ready.slice(start), "No signal; will try again.");
        break;
      }
      if (response.status === 401) {
        await holdForSignIn(ready.slice(start));
        break;
      }
      if (
        !response.ok &&
        (response.status >= 500 || response.status === 408 || response.status === 429)
      ) {
        await later(ready.slice(start), `The server answered ${response.status}; will try again.`);
        break;
      }
      const body = (await response.json().catch(() => null)) as
        | (SyncAnswer & { error?: { message?: string } })
        | null;
      if (!response.ok || !body?.results) {
        const reason = body?.error?.message ?? `The server refused the batch (${response.status}).`;
        for (const item of batch) await refuse(item, reason);
        continue;
      }
      await signalIsBack();
      const byId = new Map(body.results.filter((r) => r.id).map((r) => [r.id as string, r]));
      for (const item of batch) {
        const result = byId.get(item.record.id);
        if (!result) {
          await later([item], "The server did not answer for this record; will try again.");
        } else if (result.status === "refused") {
          await refuse(item, result.reason);
        } else {
          await updateLocalRecord(item.record.id, (r) => ({
            ...r,
            state: result.status === "duplicate" ? "duplicate" : "sent",
            sentAt: now(),
            lastError: null,
          }));
          summary.sent += 1;
        }
      }
      const { receivedAt, verdictsPending: entryIds = [] } = body;
      if (entryIds.length > 0 && receivedAt && !Number.isNaN(Date.parse(receivedAt)))
        summary.verdictsPending.push({ eventId, entryIds, receivedAt });
      onProgress?.({ sent: summary.sent, total });
    }
    announceChange({ type: "records", eventId });
  }
  return { madeDue };
}
