import { announceChange } from "./announce-change";
import { listLocalRecords } from "./list-local-records";
import { updateLocalRecord } from "./update-local-record";

/**
 * Make every queued record due now, forgetting its retry wait: when the scrutineer taps
 * "Send now", and when a request has just gone through (the signal is back, so the wait no
 * longer means anything). Records held for sign-in or refused stay as they are.
 * @returns how many records were waiting out a backoff
 */
export async function resetOutboxBackoff(opts: { now: number; eventId?: string }): Promise<number> {
  const retried = (await listLocalRecords(opts.eventId)).filter(
    (r) => r.state === "queued" && (r.nextAttemptAt > 0 || r.attempts > 0),
  );
  for (const item of retried) {
    await updateLocalRecord(item.record.id, (r) =>
      r.state === "queued" ? { ...r, attempts: 0, nextAttemptAt: 0, lastError: null } : r,
    );
  }
  for (const eventId of new Set(retried.map((r) => r.eventId))) {
    announceChange({ type: "records", eventId });
  }
  return retried.filter((r) => r.nextAttemptAt > opts.now).length;
}
