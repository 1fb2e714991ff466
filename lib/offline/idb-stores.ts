import { createStore, type UseStore } from "idb-keyval";

/** IndexedDB database and object-store names: one database per store, as idb-keyval opens each
 *  database with a single object store. Records are kept under their own id. */
export const IDB_STORE_NAMES = {
  packs: { database: "plumbline-packs", store: "packs" },
  records: { database: "plumbline-records", store: "records" },
  blobs: { database: "plumbline-blobs", store: "blobs" },
  meta: { database: "plumbline-meta", store: "meta" },
  boards: { database: "plumbline-boards", store: "boards" },
} as const;

let stores: { packs: UseStore; records: UseStore; blobs: UseStore; meta: UseStore } | undefined;

const open = (name: keyof typeof IDB_STORE_NAMES) =>
  createStore(IDB_STORE_NAMES[name].database, IDB_STORE_NAMES[name].store);

/** The phone's stores: event packs, its own records (the outbox), photo blobs, and small facts. */
export function idbStores() {
  stores ??= {
    packs: open("packs"),
    records: open("records"),
    blobs: open("blobs"),
    meta: open("meta"),
  };
  return stores;
}
