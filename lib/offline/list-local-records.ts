import { values } from "idb-keyval";
import { idbStores } from "./idb-stores";
import type { LocalRecord } from "./local-record";

/** This phone's records for an event (all of them, or every event's), oldest first. */
export async function listLocalRecords(eventId?: string): Promise<LocalRecord[]> {
  const all = await values<LocalRecord>(idbStores().records);
  return all
    .filter((item) => !eventId || item.eventId === eventId)
    .sort((a, b) => (a.record.id < b.record.id ? -1 : a.record.id > b.record.id ? 1 : 0));
}
