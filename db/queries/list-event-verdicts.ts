import "server-only";
import { eq } from "drizzle-orm";
import type { Verdict } from "../../lib/scrutineer/verdict-schema";
import { toPackVerdict } from "../../lib/tech/to-pack-verdict";
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
      result: verdicts.result,
      computedAt: verdicts.computedAt,
    })
    .from(verdicts)
    .where(eq(verdicts.eventId, eventId));
  return rows.map((r) => {
    const result = (r.result ?? {}) as Partial<Verdict>;
    return toPackVerdict({
      entryId: r.entryId,
      verdict: {
        status: r.status,
        classId: r.classId,
        reason: r.reason,
        flags: (result.flags ?? []).filter((f) => typeof f === "string"),
        override: result.override ?? null,
        rejectedOverride: result.rejectedOverride ?? null,
      },
      computedAt: r.computedAt,
    });
  });
}
