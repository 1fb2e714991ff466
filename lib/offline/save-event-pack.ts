import { update } from "idb-keyval";
import { announceChange } from "./announce-change";
import type { EventPack, PackRecord, PackVerdict } from "./event-pack-schema";
import { idbStores } from "./idb-stores";

export type StoredPack = EventPack & { fetchedAt: string };

/**
 * Store a pack. A partial pack (what changed since the phone's cursor) is merged into the stored
 * one: records are a set keyed by id, verdicts one per entry where the later `computedAt` wins
 * (so an older answer arriving last never undoes a newer verdict); replaying is harmless. A whole
 * pack replaces what was stored.
 */
export async function saveEventPack(pack: EventPack, fetchedAt: Date): Promise<StoredPack> {
  const merge = (previous: StoredPack | undefined): StoredPack => {
    // Parts the server left out because the phone had them: keep the stored ones — if what is
    // stored is still what the request said it was; else forget the cursor and ETag, so the
    // next refresh brings the whole pack.
    const entriesHeld = !pack.keptEntries || previous?.entriesTag === pack.entriesTag;
    const ruleSetHeld = !pack.keptRuleSet || previous?.ruleSetVersionId === pack.ruleSetVersionId;
    const whole = entriesHeld && ruleSetHeld;
    return {
      ...pack,
      entries: pack.keptEntries ? (previous?.entries ?? []) : pack.entries,
      ruleSet: pack.keptRuleSet ? previous?.ruleSet : pack.ruleSet,
      keptEntries: false,
      keptRuleSet: false,
      etag: whole ? pack.etag : "",
      recordsCursor: whole ? pack.recordsCursor : null,
      records: previous ? mergeRecords(previous.records, pack.records) : pack.records,
      verdicts: previous ? mergeVerdicts(previous.verdicts, pack.verdicts) : pack.verdicts,
      partial: false,
      fetchedAt: fetchedAt.toISOString(),
    };
  };
  let stored = merge(undefined);
  // Read and write in one IndexedDB transaction: two refreshes saving at once never lose a merge.
  await update<StoredPack>(
    pack.event.id,
    (previous) => {
      stored = merge(pack.partial ? previous : undefined);
      return stored;
    },
    idbStores().packs,
  );
  announceChange({ type: "pack", eventId: pack.event.id });
  return stored;
}

function mergeRecords(stored: PackRecord[], incoming: PackRecord[]): PackRecord[] {
  const byId = new Map(stored.map((r) => [r.id, r]));
  for (const r of incoming) byId.set(r.id, r);
  return [...byId.values()];
}

function mergeVerdicts(stored: PackVerdict[], incoming: PackVerdict[]): PackVerdict[] {
  const byEntry = new Map(stored.map((v) => [v.entryId, v]));
  for (const v of incoming) {
    const held = byEntry.get(v.entryId);
    if (!held || Date.parse(v.computedAt) >= Date.parse(held.computedAt)) byEntry.set(v.entryId, v);
  }
  return [...byEntry.values()];
}
