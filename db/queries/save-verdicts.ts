import "server-only";
import { and, eq, inArray, sql } from "drizzle-orm";
import type { VerdictStatus } from "../../lib/scrutineer/verdict-schema";
import { getDb } from "../client";
import { verdicts } from "../schema";

export type VerdictRow = {
  entryId: string;
  status: VerdictStatus;
  finalClass: string | null;
  needsChief: boolean;
  reason: string;
  result: unknown;
  recordCount: number;
};

/**
 * Store freshly derived verdicts (a cache: always re-derivable from the records) and return the
 * status each entry had before, so callers can tell people what changed.
 */
export async function saveVerdicts({
  eventId,
  ruleSetVersionId,
  rows,
  computedAt,
}: {
  eventId: string;
  ruleSetVersionId: string;
  rows: VerdictRow[];
  computedAt: Date;
}): Promise<Map<string, { status: VerdictStatus; finalClass: string | null } | null>> {
  const before = new Map<string, { status: VerdictStatus; finalClass: string | null } | null>();
  if (rows.length === 0) return before;
  await getDb().transaction(async (tx) => {
    const previous = await tx
      .select({
        entryId: verdicts.entryId,
        status: verdicts.status,
        finalClass: verdicts.finalClass,
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
      .for("update");
    for (const row of rows) before.set(row.entryId, null);
    for (const p of previous) before.set(p.entryId, { status: p.status, finalClass: p.finalClass });
    await tx
      .insert(verdicts)
      .values(
        rows.map((r) => ({
          eventId,
          entryId: r.entryId,
          status: r.status,
          finalClass: r.finalClass,
          needsChief: r.needsChief,
          reason: r.reason.slice(0, 500),
          ruleSetVersionId,
          result: r.result,
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
          recordCount: sql`values(${verdicts.recordCount})`,
          computedAt: sql`values(${verdicts.computedAt})`,
        },
      });
  });
  return before;
}
