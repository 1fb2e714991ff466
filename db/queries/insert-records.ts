import "server-only";
import { inArray } from "drizzle-orm";
import type { TechRecord } from "../../lib/scrutineer/record-schema";
import { stableStringify } from "../../lib/scrutineer/stable-stringify";
import { getDb } from "../client";
import { records } from "../schema";

export type InsertOutcome = "stored" | "duplicate" | "conflict";

/**
 * Store records idempotently, all in one transaction: a record whose id is already stored with
 * the same content is a duplicate (nothing written); the same id with other content is a conflict
 * (nothing written). Records are never updated.
 */
export async function insertRecords({
  eventId,
  batch,
  receivedAt,
}: {
  eventId: string;
  batch: TechRecord[];
  receivedAt: Date;
}): Promise<Map<string, InsertOutcome>> {
  const outcomes = new Map<string, InsertOutcome>();
  if (batch.length === 0) return outcomes;
  await getDb().transaction(async (tx) => {
    const existing = await tx
      .select()
      .from(records)
      .where(
        inArray(
          records.id,
          batch.map((r) => r.id),
        ),
      )
      .for("update");
    const byId = new Map(existing.map((row) => [row.id, row]));
    const fresh: (typeof records.$inferInsert)[] = [];
    for (const record of batch) {
      const stored = byId.get(record.id);
      if (stored) {
        const same =
          stored.eventId === eventId &&
          stored.entryId === record.entryId &&
          stored.kind === record.kind &&
          stored.officialId === record.officialId &&
          stableStringify(stored.payload) === stableStringify(record.payload);
        outcomes.set(record.id, same ? "duplicate" : "conflict");
        continue;
      }
      if (outcomes.has(record.id)) continue; // the same id twice in one batch: keep the first
      outcomes.set(record.id, "stored");
      fresh.push({
        id: record.id,
        eventId,
        entryId: record.entryId,
        kind: record.kind,
        payload: record.payload,
        officialId: record.officialId,
        deviceId: record.deviceId,
        deviceTime: new Date(record.deviceTime),
        receivedAt,
      });
    }
    if (fresh.length > 0) await tx.insert(records).values(fresh);
  });
  return outcomes;
}
