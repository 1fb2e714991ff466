import type { Page } from "@playwright/test";
import type { OfflineChange } from "../../lib/offline/announce-change";
import { DEVICE_ID_KEY } from "../../lib/offline/get-device-id";
import { IDB_STORE_NAMES } from "../../lib/offline/idb-stores";
import type { LocalRecord } from "../../lib/offline/local-record";
import { makeRecord } from "../../lib/offline/make-record";
import { newLocalRecord } from "../../lib/offline/new-local-record";
import { OUTBOX_CHANNEL } from "../../lib/offline/outbox-constants";

/**
 * Put `count` readings in the phone's outbox without typing each one: made by the tech line's own
 * `makeRecord`, kept as `newLocalRecord` builds them (what `addLocalRecord` stores), written into
 * the outbox's IndexedDB store under their ids from inside the page, then announced on the
 * outbox's channel so the open tech line lists them — as if typed. They carry this phone's device
 * id and the signed-in official. Readings are spread over `entryIds` in turn; device times are a
 * millisecond apart and a little in the past, so their ids (UUID v7) are in the order made, which
 * is the order the outbox sends them. Returns the ids in that order. Test data for the transport,
 * not a trade value.
 */
export async function queueReadings(
  page: Page,
  opts: { eventId: string; officialId: string; entryIds: string[]; count: number },
): Promise<string[]> {
  const names = IDB_STORE_NAMES;
  const deviceId = await page.evaluate(
    async ({ meta, key }) => {
      const db = await new Promise<IDBDatabase>((resolve, reject) => {
        const open = indexedDB.open(meta.database);
        open.onsuccess = () => resolve(open.result);
        open.onerror = () => reject(open.error);
      });
      return new Promise<unknown>((resolve, reject) => {
        const get = db.transaction(meta.store).objectStore(meta.store).get(key);
        get.onsuccess = () => resolve(get.result);
        get.onerror = () => reject(get.error);
      });
    },
    { meta: names.meta, key: DEVICE_ID_KEY },
  );
  if (typeof deviceId !== "string") throw new Error("the tech line has not made its device id yet");

  const start = Date.now() - 120_000;
  const items: LocalRecord[] = Array.from({ length: opts.count }, (_, n) => {
    const record = makeRecord({
      kind: "reading",
      payload: {
        dimension: "wingSpanMm",
        value: 1400 + (n % 50) * 0.1,
        instrument: { id: "tape", name: "Steel tape", standardUncertainty: 0.5 },
        conditions: { levelPad: true },
      },
      entryId: opts.entryIds[n % opts.entryIds.length] ?? "",
      officialId: opts.officialId,
      deviceId,
      now: new Date(start + n),
    });
    return newLocalRecord({ eventId: opts.eventId, record, hasBlob: false, now: Date.now() });
  });
  const change: OfflineChange = { type: "records", eventId: opts.eventId };
  await page.evaluate(
    async ({ records, items, channel, change }) => {
      const db = await new Promise<IDBDatabase>((resolve, reject) => {
        const open = indexedDB.open(records.database);
        open.onsuccess = () => resolve(open.result);
        open.onerror = () => reject(open.error);
      });
      await new Promise<void>((resolve, reject) => {
        const tx = db.transaction(records.store, "readwrite");
        const store = tx.objectStore(records.store);
        for (const item of items) store.put(item, item.record.id);
        tx.oncomplete = () => resolve();
        tx.onerror = () => reject(tx.error);
      });
      db.close();
      const announce = new BroadcastChannel(channel);
      announce.postMessage(change);
      announce.close();
    },
    { records: names.records, items, channel: OUTBOX_CHANNEL, change },
  );
  return items.map((item) => item.record.id);
}
