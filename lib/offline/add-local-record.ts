import { set } from "idb-keyval";
import type { TechRecord } from "../scrutineer/records/record-schema";
import { announceChange } from "./announce-change";
import { idbStores } from "./idb-stores";
import type { LocalRecord } from "./local-record";
import { newLocalRecord } from "./new-local-record";

/**
 * Save a record on the phone at once (the outbox persists it before anything is sent). A photo's
 * image goes into the blob store under the record's id.
 */
export async function addLocalRecord(opts: {
  eventId: string;
  record: TechRecord;
  blob?: Blob;
  now: number;
}): Promise<LocalRecord> {
  const { records, blobs } = idbStores();
  if (opts.blob) await set(opts.record.id, opts.blob, blobs);
  const item = newLocalRecord({
    eventId: opts.eventId,
    record: opts.record,
    hasBlob: Boolean(opts.blob),
    now: opts.now,
  });
  await set(opts.record.id, item, records);
  announceChange({ type: "records", eventId: opts.eventId });
  return item;
}
