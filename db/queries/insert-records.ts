import "server-only";
import { inArray, sql } from "drizzle-orm";
import type { TechRecord } from "../../lib/scrutineer/record-schema";
import { stableStringify } from "../../lib/scrutineer/stable-stringify";
import type { Tx } from "../run-transaction";
import { records } from "../schema";

export type InsertOutcome = "stored" | "duplicate" | "conflict";

/**
 * Store a batch idempotently inside the caller's transaction with one statement that takes no
 * lock another phone's batch can wait on: `INSERT … ON DUPLICATE KEY UPDATE id = id` (a new id
 * takes only an insert-intention lock, and those never conflict with each other; an id already
 * stored is left as it was, and unlike `INSERT IGNORE` no other error is turned into a warning).
 * Then one read of the batch's ids says what happened: a row carrying this request's receive
 * time is ours (stored); any other row was there before — the same content is a duplicate, other
 * content a conflict. Records are never updated.
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
  const stored = new Map(
    (
      await tx
        .select()
        .from(records)
        .where(
          inArray(
            records.id,
            unique.map((r) => r.id),
          ),
        )
    ).map((row) => [row.id, row]),
  );
  for (const record of unique) {
    const row = stored.get(record.id);
    const same =
      row !== undefined &&
      row.eventId === eventId &&
      row.entryId === record.entryId &&
      row.kind === record.kind &&
      row.officialId === record.officialId &&
      stableStringify(row.payload) === stableStringify(record.payload);
    const ours = row !== undefined && row.receivedAt.getTime() === receivedAt.getTime();
    outcomes.set(record.id, !same ? "conflict" : ours ? "stored" : "duplicate");
  }
  return outcomes;
}
