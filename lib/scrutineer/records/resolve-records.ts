import type { VerdictFlag } from "../verdicts/verdict-schema";
import type { TechRecord, TechRecordOf } from "./record-schema";
import { resolveVoids } from "./resolve-voids";
import { stableStringify } from "./stable-stringify";

/** An entry's records after de-duplication, voids and "latest wins" are applied. */
export type ResolvedRecords = {
  /** Effective readings, ordered by record id. */
  readings: TechRecordOf<"reading">[];
  /** The latest effective checklist answer per item id. */
  checklist: Map<string, TechRecordOf<"checklist">>;
  /** The latest effective override, if any. */
  override: TechRecordOf<"override"> | null;
  counts: { total: number; used: number; voided: number; ignored: number };
  /** Effective readings, checklist answers, photos and notes: what shows the car was inspected. */
  inspectionRecords: number;
  flags: Set<VerdictFlag>;
};

const byId = (a: { id: string }, b: { id: string }) => (a.id < b.id ? -1 : a.id > b.id ? 1 : 0);

/** Later by device time, then by id (UUID v7 ids are time-ordered too). */
function isLater(a: TechRecord, b: TechRecord): boolean {
  const ta = Date.parse(a.deviceTime);
  const tb = Date.parse(b.deviceTime);
  return ta !== tb ? ta > tb : a.id > b.id;
}

/**
 * Applies the record rules so that the verdict depends on the set of records, never on their
 * order: records of other entries are ignored; a record sent twice counts once (if two copies
 * differ, one is chosen by content and the verdict is flagged); voids follow the one void rule,
 * {@link resolveVoids} (a void cancels its target unless it is itself voided, so a void can be
 * undone by voiding it; voids that form a cycle are ignored and flagged); for a checklist item and
 * for overrides, the latest by device time wins. Linear in the number of records.
 */
export function resolveRecords(
  records: ReadonlyArray<TechRecord>,
  entryId: string,
): ResolvedRecords {
  const flags = new Set<VerdictFlag>();
  let ignored = 0;
  const copies = new Map<string, TechRecord[]>();
  for (const r of records) {
    if (r.entryId !== entryId) {
      ignored += 1;
      flags.add("foreign-record");
      continue;
    }
    const list = copies.get(r.id);
    if (list) list.push(r);
    else copies.set(r.id, [r]);
  }
  const unique: TechRecord[] = [];
  for (const list of copies.values()) {
    const only = list.length === 1 ? list[0] : undefined;
    if (only !== undefined) {
      unique.push(only);
      continue;
    }
    const texts = list.map((r) => ({ r, text: stableStringify(r) }));
    texts.sort((a, b) => (a.text < b.text ? -1 : a.text > b.text ? 1 : 0));
    const first = texts[0];
    if (first === undefined) continue;
    if (texts.some((t) => t.text !== first.text)) flags.add("duplicate-record");
    ignored += list.length - 1;
    unique.push(first.r);
  }
  unique.sort(byId);

  const { voided: voidedIds, inCycle } = resolveVoids(unique);
  if (inCycle.size > 0) flags.add("void-cycle");
  const isVoided = (id: string): boolean => voidedIds.has(id);

  const readings: TechRecordOf<"reading">[] = [];
  const checklist = new Map<string, TechRecordOf<"checklist">>();
  let override: TechRecordOf<"override"> | null = null;
  let voided = 0;
  let inspectionRecords = 0;
  for (const r of unique) {
    if (isVoided(r.id)) {
      voided += 1;
      continue;
    }
    if (r.kind !== "void" && r.kind !== "override") inspectionRecords += 1;
    if (r.kind === "reading") readings.push(r);
    else if (r.kind === "checklist") {
      const current = checklist.get(r.payload.itemId);
      if (current === undefined || isLater(r, current)) checklist.set(r.payload.itemId, r);
    } else if (r.kind === "override") {
      if (override === null || isLater(r, override)) override = r;
    }
  }
  return {
    readings,
    checklist,
    override,
    counts: { total: records.length, used: unique.length - voided, voided, ignored },
    inspectionRecords,
    flags,
  };
}
