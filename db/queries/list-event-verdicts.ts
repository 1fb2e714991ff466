import "server-only";
import { eq } from "drizzle-orm";
import { getDb } from "../client";
import { verdicts } from "../schema";

/** The stored verdicts of an event, in the short form phones and boards use. */
export async function listEventVerdicts({ eventId }: { eventId: string }) {
  const rows = await getDb()
    .select({
      entryId: verdicts.entryId,
      status: verdicts.status,
      classId: verdicts.finalClass,
      reason: verdicts.reason,
      needsChief: verdicts.needsChief,
      result: verdicts.result,
      computedAt: verdicts.computedAt,
    })
    .from(verdicts)
    .where(eq(verdicts.eventId, eventId));
  return rows.map((r) => ({
    entryId: r.entryId,
    status: r.status,
    classId: r.classId,
    reason: r.reason,
    needsChief: r.needsChief,
    flags: ((r.result as { flags?: string[] } | null)?.flags ?? []).filter(
      (f) => typeof f === "string",
    ),
    computedAt: r.computedAt.toISOString(),
  }));
}
