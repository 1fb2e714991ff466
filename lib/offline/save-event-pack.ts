import { get, set } from "idb-keyval";
import { announceChange } from "./announce-change";
import type { EventPack, PackVerdict } from "./event-pack-schema";
import { idbStores } from "./idb-stores";

export type StoredPack = EventPack & { fetchedAt: string };

/**
 * Store a pack. A partial pack (records since the phone's cursor) is merged into the stored one:
 * records are a set keyed by id, so merging is a union and replaying is harmless.
 */
export async function saveEventPack(pack: EventPack, fetchedAt: Date): Promise<StoredPack> {
  const { packs } = idbStores();
  const previous = pack.partial ? await get<StoredPack>(pack.event.id, packs) : undefined;
  const records = previous ? mergeById(previous.records, pack.records) : pack.records;
  const stored: StoredPack = {
    ...pack,
    records,
    partial: false,
    fetchedAt: fetchedAt.toISOString(),
  };
  await set(pack.event.id, stored, packs);
  announceChange({ type: "pack", eventId: pack.event.id });
  return stored;
}

/** Put the server's fresh verdicts (from a sync answer) into the stored pack. */
export async function saveServerVerdicts(eventId: string, verdicts: PackVerdict[]): Promise<void> {
  if (verdicts.length === 0) return;
  const { packs } = idbStores();
  const pack = await get<StoredPack>(eventId, packs);
  if (!pack) return;
  const byEntry = new Map(pack.verdicts.map((v) => [v.entryId, v]));
  for (const v of verdicts) byEntry.set(v.entryId, v);
  await set(eventId, { ...pack, verdicts: [...byEntry.values()] }, packs);
  announceChange({ type: "pack", eventId });
}

function mergeById<T extends { id: string }>(a: T[], b: T[]): T[] {
  const byId = new Map(a.map((r) => [r.id, r]));
  for (const r of b) byId.set(r.id, r);
  return [...byId.values()];
}
