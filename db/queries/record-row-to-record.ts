import type { records } from "../schema";

/** A stored record, shaped as the engine and the phone know it (recordSchema's input). */
export type StoredRecord = {
  id: string;
  entryId: string;
  kind: (typeof records.$inferSelect)["kind"];
  payload: unknown;
  officialId: string;
  deviceId: string;
  deviceTime: string;
  receivedAt: string;
};

/** Turn a `records` row into the plain record the engine reads. */
export function recordRowToRecord(row: typeof records.$inferSelect): StoredRecord {
  return {
    id: row.id,
    entryId: row.entryId,
    kind: row.kind,
    payload: row.payload,
    officialId: row.officialId,
    deviceId: row.deviceId,
    deviceTime: row.deviceTime.toISOString(),
    receivedAt: row.receivedAt.toISOString(),
  };
}
