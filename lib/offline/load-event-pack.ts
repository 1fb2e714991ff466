import { get } from "idb-keyval";
import { idbStores } from "./idb-stores";
import type { StoredPack } from "./save-event-pack";

/** The event pack stored on this phone, or undefined before "Prepare for offline". */
export function loadEventPack(eventId: string): Promise<StoredPack | undefined> {
  return get<StoredPack>(eventId, idbStores().packs);
}
