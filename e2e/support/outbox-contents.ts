import type { Page } from "@playwright/test";
import { IDB_STORE_NAMES } from "../../lib/offline/idb-stores";
import type { LocalRecord, LocalRecordState } from "../../lib/offline/local-record";

export type OutboxItem = { id: string; entryId: string; state: LocalRecordState };

/** What the phone's outbox holds for an event, read from its IndexedDB store in the page. */
export async function outboxContents(page: Page, eventId: string): Promise<OutboxItem[]> {
  return page.evaluate(
    async ({ records, eventId }) => {
      const db = await new Promise<IDBDatabase>((resolve, reject) => {
        const open = indexedDB.open(records.database);
        open.onsuccess = () => resolve(open.result);
        open.onerror = () => reject(open.error);
      });
      if (!db.objectStoreNames.contains(records.store)) return [];
      const all = await new Promise<LocalRecord[]>((resolve, reject) => {
        const get = db.transaction(records.store).objectStore(records.store).getAll();
        get.onsuccess = () => resolve(get.result as LocalRecord[]);
        get.onerror = () => reject(get.error);
      });
      db.close();
      return all
        .filter((item) => item.eventId === eventId)
        .map((item) => ({ id: item.record.id, entryId: item.record.entryId, state: item.state }));
    },
    { records: IDB_STORE_NAMES.records, eventId },
  );
}

/** How many of the items are in each state, e.g. `{ sent: 450, duplicate: 50 }`. */
export function countStates(items: OutboxItem[]): Partial<Record<LocalRecordState, number>> {
  const counts: Partial<Record<LocalRecordState, number>> = {};
  for (const item of items) counts[item.state] = (counts[item.state] ?? 0) + 1;
  return counts;
}
