import { get } from "idb-keyval";
import { idbStores } from "./idb-stores";

/** A photo's image still held on this phone (until it is uploaded), or undefined. */
export function loadPhotoBlob(recordId: string): Promise<Blob | undefined> {
  return get<Blob>(recordId, idbStores().blobs);
}
