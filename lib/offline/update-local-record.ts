import { update } from "idb-keyval";
import { idbStores } from "./idb-stores";
import type { LocalRecord } from "./local-record";

/** Change one stored record's outbox state (atomically, in IndexedDB). */
export function updateLocalRecord(
  id: string,
  change: (item: LocalRecord) => LocalRecord,
): Promise<void> {
  return update<LocalRecord>(
    id,
    (item) => {
      if (!item) throw new Error(`no local record ${id}`);
      return change(item);
    },
    idbStores().records,
  );
}
