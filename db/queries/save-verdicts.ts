import "server-only";
import { and, eq, inArray, sql } from "drizzle-orm";
import type { VerdictStatus } from "../../lib/scrutineer/verdicts/verdict-schema";
import type { Tx } from "../run-transaction";
import { verdicts } from "../schema";

export type VerdictRow = {
  entryId: string;
  status: VerdictStatus;
  finalClass: string | null;
  needsChief: boolean;
  reason: string;
  result: unknown;
  /** SHA-256 of `result` as stored: the same hash means the same explanation. */
  resultHash: string;
  recordCount: number;
};

export type StoredVerdictBefore = { status: VerdictStatus; finalClass: string | null } | null;

/**
 * Store freshly derived verdicts (a cache: always re-derivable from the records) in the caller's
 * transaction, and return the status each entry had before, so callers can tell people what
 * changed. The rows are locked first, so two recomputes of one entry take turns. A verdict whose
 * explanation is unchanged (same hash, same rule-set version) gets only its new `computedAt`: the
 * explanation JSON is written when it changes, not on every batch.
 */
export async function saveVerdicts({
  tx,
  eventId,
  ruleSetVersionId,
  rows,
  computedAt,
}: {
  tx: Tx;
  eventId: string;
  ruleSetVersionId: string;
  rows: VerdictRow[];
  computedAt: Date;
}): Promise<Map<string, StoredVerdictBefore>> {
  const before = new Map<string, StoredVerdictBefore>();
  if (rows.length === 0) return before;
  const previous = await tx
    .select({
      entryId: verdicts.entryId,
      status: verdicts.status,
      finalClass: verdicts.finalClass,
      resultHash: verdicts.resultHash,
      ruleSetVersionId: verdicts.ruleSetVersionId,
    })
    .from(verdicts)
    .where(
      and(
        eq(verdicts.eventId, eventId),
        inArray(
          verdicts.entryId,
          rows.map((r) => r.entryId),
        ),
      ),
    )
    .orderBy(verdicts.entryId)
    .for("update");
  const byEntry = new Map(rows.map((r) => [r.entryId, r]));
  for (const row of rows) before.set(row.entryId, null);
  const unchanged = new Set<string>();
  for (const p of previous) {
    before.set(p.entryId, { status: p.status, finalClass: p.finalClass });
    const row = byEntry.get(p.entryId);
    if (row && row.resultHash === p.resultHash && p.ruleSetVersionId === ruleSetVersionId) {
      unchanged.add(p.entryId);
    }
  }
  if (unchanged.size > 0) {
    await tx
      .update(verdicts)
      .set({ computedAt })
      .where(and(eq(verdicts.eventId, eventId), inArray(verdicts.entryId, [...unchanged])));
  }
  const changed = rows.filter((r) => !unchanged.has(r.entryId));
  if (changed.length === 0) return before;
  await tx
    .insert(verdicts)
    .values(
      changed.map((r) => ({
        eventId,
        entryId: r.entryId,
        status: r.status,
        finalClass: r.finalClass,
        needsChief: r.needsChief,
        reason: r.reason.slice(0, 500),
        ruleSetVersionId,
        result: r.result,
        resultHash: r.resultHash,
        recordCount: r.recordCount,
        computedAt,
      })),
    )
    .onDuplicateKeyUpdate({
      set: {
        status: sql`values(${verdicts.status})`,
        finalClass: sql`values(${verdicts.finalClass})`,
        needsChief: sql`values(${verdicts.needsChief})`,
        reason: sql`values(${verdicts.reason})`,
        ruleSetVersionId: sql`values(${verdicts.ruleSetVersionId})`,
        result: sql`values(${verdicts.result})`,
        resultHash: sql`values(${verdicts.resultHash})`,
        recordCount: sql`values(${verdicts.recordCount})`,
        computedAt: sql`values(${verdicts.computedAt})`,
      },
    });
  return before;
}
