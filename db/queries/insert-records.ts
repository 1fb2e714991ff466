import "server-only";
import { inArray, sql } from "drizzle-orm";
import type { TechRecord } from "../../lib/scrutineer/records/record-schema";
import { stableStringify } from "../../lib/scrutineer/records/stable-stringify";
import type { Tx } from "../run-transaction";
import { records } from "../schema";

export type InsertOutcome = "stored" | "duplicate" | "conflict";

/**
 * Store a batch idempotently inside the caller's transaction with one statement that takes no
 * lock another phone's batch can wait on: `INSERT … ON DUPLICATE KEY UPDATE id = id` (a new id
 * takes only an insert-intention lock, and those never conflict with each other; an id already
 * stored is left as it was, and unlike `INSERT IGNORE` no other error is turned into a warning).
 * Then a narrow read of the batch's ids and receive times says what happened: a row carrying this
 * request's receive time is ours (stored); only the rows that were there before are read whole and
 * compared — the same content is a duplicate, other content a conflict. Records are never updated.
 */
export async function insertRecords({
  tx,
  eventId,
  batch,
  receivedAt,
}: {
  tx: Tx;
  eventId: string;
  batch: TechRecord[];
  receivedAt: Date;
}): Promise<Map<string, InsertOutcome>> {
  const outcomes = new Map<string, InsertOutcome>();
  // The same id twice in one batch: keep the first.
  const seen = new Set<string>();
  const unique = batch.filter((r) => !seen.has(r.id) && seen.add(r.id));
  if (unique.length === 0) return outcomes;
  await tx
    .insert(records)
    .values(
      unique.map((record) => ({
        id: record.id,
        eventId,
        entryId: record.entryId,
        kind: record.kind,
        payload: record.payload,
        officialId: record.officialId,
        deviceId: record.deviceId,
        deviceTime: new Date(record.deviceTime),
        receivedAt,
      })),
    )
    .onDuplicateKeyUpdate({ set: { id: sql`${records.id}` } });
  // Which rows carry this request's receive time (ours: stored) — a narrow read, no payloads.
  const stamps = await tx
    .select({ id: records.id, receivedAt: records.receivedAt })
    .from(records)
    .where(
      inArray(
        records.id,
        unique.map((r) => r.id),
      ),
    );
  const earlier = new Set(
    stamps.filter((s) => s.receivedAt.getTime() !== receivedAt.getTime()).map((s) => s.id),
  );
  for (const record of unique) if (!earlier.has(record.id)) outcomes.set(record.id, "stored");
  if (earlier.size === 0) return outcomes;
  // The ids that were there before: compare what is stored with what was sent.
  const stored = new Map(
    (
      await tx
        .select()
        .from(records)
        .where(inArray(records.id, [...earlier]))
    ).map((row) => [row.id, row]),
  );
  for (const record of unique) {
    if (!earlier.has(record.id)) continue;
    const row = stored.get(record.id);
    const same =
      row !== undefined &&
      row.eventId === eventId &&
      row.entryId === record.entryId &&
      row.kind === record.kind &&
      row.officialId === record.officialId &&
      stableStringify(row.payload) === stableStringify(record.payload);
    outcomes.set(record.id, same ? "duplicate" : "conflict");
  }
  return outcomes;
}
