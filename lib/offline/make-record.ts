import { v7 as uuidv7 } from "uuid";
import type { TechRecord } from "../scrutineer/records/record-schema";

type Kind = TechRecord["kind"];

/**
 * A new immutable record, made on the phone: a time-ordered UUID v7, the official, the device and
 * the device's clock (ISO 8601 with offset). The server adds its own receive time.
 */
export function makeRecord<K extends Kind>(opts: {
  kind: K;
  payload: Extract<TechRecord, { kind: K }>["payload"];
  entryId: string;
  officialId: string;
  deviceId: string;
  now: Date;
}): Extract<TechRecord, { kind: K }> {
  return {
    id: uuidv7({ msecs: opts.now.getTime() }),
    kind: opts.kind,
    payload: opts.payload,
    entryId: opts.entryId,
    officialId: opts.officialId,
    deviceId: opts.deviceId,
    deviceTime: opts.now.toISOString(),
  } as Extract<TechRecord, { kind: K }>;
}
