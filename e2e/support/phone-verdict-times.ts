import type { Page } from "@playwright/test";
import { IDB_STORE_NAMES } from "../../lib/offline/idb-stores";
import type { StoredPack } from "../../lib/offline/save-event-pack";

/** When each verdict in the phone's stored event pack was computed (ms), by entry id. */
export async function phoneVerdictTimes(
  page: Page,
  eventId: string,
): Promise<Record<string, number>> {
  return page.evaluate(
    async ({ packs, eventId }) => {
      const db = await new Promise<IDBDatabase>((resolve, reject) => {
        const open = indexedDB.open(packs.database);
        open.onsuccess = () => resolve(open.result);
        open.onerror = () => reject(open.error);
      });
      const pack = await new Promise<StoredPack | undefined>((resolve, reject) => {
        const get = db.transaction(packs.store).objectStore(packs.store).get(eventId);
        get.onsuccess = () => resolve(get.result as StoredPack | undefined);
        get.onerror = () => reject(get.error);
      });
      db.close();
      return Object.fromEntries(
        (pack?.verdicts ?? []).map((v) => [v.entryId, Date.parse(v.computedAt)]),
      );
    },
    { packs: IDB_STORE_NAMES.packs, eventId },
  );
}
