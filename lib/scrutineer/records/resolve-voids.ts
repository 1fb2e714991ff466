import type { TechRecord, TechRecordOf } from "./record-schema";
import { stableStringify } from "./stable-stringify";

/** Which records are cancelled by a void in force, and which voids loop back on themselves. */
export type VoidResolution = {
  /** Ids of records cancelled by at least one void in force. */
  voided: ReadonlySet<string>;
  /** For each cancelled record, the void in force that cancels it (the lowest id, if several). */
  voidedBy: ReadonlyMap<string, TechRecordOf<"void">>;
  /** Voids whose chain of targets loops back on itself: they have no effect. */
  inCycle: ReadonlySet<string>;
};

/**
 * The one void rule of the tech line, used by the engine (`resolveRecords`) and by every screen
 * that strikes a record through:
 * - a void cancels its target unless the void is itself cancelled (so voiding a void undoes it);
 * - voids whose chain of targets loops back (A voids B, B voids A) have no effect;
 * - the same void id sent twice counts once (copies that differ: the first by content, as the
 *   engine picks it).
 * Linear in the number of records, and iterative (no recursion), so a chain of 100,000 voids
 * neither stalls the server nor overflows the stack: each void has exactly one target, so voids
 * form a functional graph whose cycles one colouring walk finds; "is cancelled" is then settled
 * from the leaves inward (a void nobody voids is in force), each void visited once.
 */
export function resolveVoids(records: ReadonlyArray<TechRecord>): VoidResolution {
  // One void per id (copies that differ: the smallest by content, as resolveRecords chooses).
  const voids = new Map<string, { record: TechRecordOf<"void">; text: string | null }>();
  for (const r of records) {
    if (r.kind !== "void") continue;
    const known = voids.get(r.id);
    if (known === undefined) {
      voids.set(r.id, { record: r, text: null });
      continue;
    }
    const a = known.text ?? stableStringify(known.record);
    const b = stableStringify(r);
    voids.set(r.id, b < a ? { record: r, text: b } : { record: known.record, text: a });
  }
  const targetOf = (id: string): string | undefined => voids.get(id)?.record.payload.targetRecordId;

  // 1. Cycles: walk each void's chain once; 0 = unseen, 1 = on the current walk, 2 = done.
  const colour = new Map<string, 1 | 2>();
  const inCycle = new Set<string>();
  for (const start of voids.keys()) {
    if (colour.has(start)) continue;
    const path: string[] = [];
    let at: string | undefined = start;
    while (at !== undefined && voids.has(at) && !colour.has(at)) {
      colour.set(at, 1);
      path.push(at);
      at = targetOf(at);
    }
    if (at !== undefined && colour.get(at) === 1) {
      // The walk came back to a void on this very walk: from there to the end is a loop.
      for (let i = path.lastIndexOf(at); i < path.length; i += 1) {
        const id = path[i];
        if (id !== undefined) inCycle.add(id);
      }
    }
    for (const id of path) colour.set(id, 2);
  }

  // 2. Which voids are in force, leaves first: a void is cancelled when a void in force targets
  // it. `pending` counts the voids aimed at each void that are not settled yet.
  const pending = new Map<string, number>();
  for (const [id, { record }] of voids) {
    if (inCycle.has(id)) continue;
    const target = record.payload.targetRecordId;
    pending.set(target, (pending.get(target) ?? 0) + 1);
  }
  const voidedBy = new Map<string, TechRecordOf<"void">>();
  const ready: string[] = [];
  for (const id of voids.keys()) if (!inCycle.has(id) && !pending.has(id)) ready.push(id);
  for (let next = ready.pop(); next !== undefined; next = ready.pop()) {
    const record = voids.get(next)?.record;
    if (record === undefined) continue;
    const target = record.payload.targetRecordId;
    if (!voidedBy.has(next)) {
      const current = voidedBy.get(target);
      if (current === undefined || record.id < current.id) voidedBy.set(target, record);
    }
    const left = (pending.get(target) ?? 1) - 1;
    pending.set(target, left);
    // A void outside every loop is settled once all voids aimed at it are; a loop's voids never
    // take effect, so they are not queued.
    if (left === 0 && voids.has(target) && !inCycle.has(target)) ready.push(target);
  }
  return { voided: new Set(voidedBy.keys()), voidedBy, inCycle };
}
