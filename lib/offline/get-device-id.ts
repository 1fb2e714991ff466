import { get, set } from "idb-keyval";
import { v7 as uuidv7 } from "uuid";
import { idbStores } from "./idb-stores";

/** This phone's id, made once and kept in IndexedDB; every record carries it. */
export async function getDeviceId(): Promise<string> {
  const { meta } = idbStores();
  const existing = await get<string>("device-id", meta);
  if (existing) return existing;
  const id = `phone-${uuidv7()}`;
  await set("device-id", id, meta);
  return id;
}
