import type { TechRecord } from "../scrutineer/records/record-schema";
import type { LocalRecord } from "./local-record";

/**
 * A record as the outbox first keeps it: queued, never tried, due at once. `addLocalRecord` stores
 * exactly this; the browser tests build their bulk outboxes with it too, so the two cannot drift.
 */
export function newLocalRecord(opts: {
  eventId: string;
  record: TechRecord;
  hasBlob: boolean;
  now: number;
}): LocalRecord {
  return {
    record: opts.record,
    eventId: opts.eventId,
    state: "queued",
    attempts: 0,
    nextAttemptAt: 0,
    lastError: null,
    createdAt: opts.now,
    sentAt: null,
    blob: opts.hasBlob ? "waiting" : "none",
  };
}
