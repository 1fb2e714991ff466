import { get, set } from "idb-keyval";
import { v7 as uuidv7 } from "uuid";
import { idbStores } from "./idb-stores";

/** Where in the meta store the device id is kept. */
export const DEVICE_ID_KEY = "device-id";

/** This phone's id, made once and kept in IndexedDB; every record carries it. */
export async function getDeviceId(): Promise<string> {
  const { meta } = idbStores();
  const existing = await get<string>(DEVICE_ID_KEY, meta);
  if (existing) return existing;
  const id = `phone-${uuidv7()}`;
  await set(DEVICE_ID_KEY, id, meta);
  return id;
}
