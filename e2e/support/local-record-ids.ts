import type { Page } from "@playwright/test";

/** The ids of the records this phone made for an entry (its outbox, in IndexedDB), sorted. */
export async function localRecordIds(page: Page, entryId: string): Promise<string[]> {
  const ids = await page.evaluate(async (id) => {
    const db = await new Promise<IDBDatabase>((resolve, reject) => {
      const open = indexedDB.open("plumbline-records");
      open.onsuccess = () => resolve(open.result);
      open.onerror = () => reject(open.error);
    });
    if (!db.objectStoreNames.contains("records")) return [];
    return new Promise<string[]>((resolve) => {
      const all = db.transaction("records").objectStore("records").getAll();
      all.onsuccess = () =>
        resolve(
          (all.result as { record: { id: string; entryId: string } }[])
            .filter((r) => r.record.entryId === id)
            .map((r) => r.record.id),
        );
    });
  }, entryId);
  return ids.sort();
}
