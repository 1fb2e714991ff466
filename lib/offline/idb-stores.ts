import { createStore, type UseStore } from "idb-keyval";

// One IndexedDB database per store: idb-keyval opens each database with a single object store.
let stores: { packs: UseStore; records: UseStore; blobs: UseStore; meta: UseStore } | undefined;

/** The phone's stores: event packs, its own records (the outbox), photo blobs, and small facts. */
export function idbStores() {
  stores ??= {
    packs: createStore("plumbline-packs", "packs"),
    records: createStore("plumbline-records", "records"),
    blobs: createStore("plumbline-blobs", "blobs"),
    meta: createStore("plumbline-meta", "meta"),
  };
  return stores;
}
