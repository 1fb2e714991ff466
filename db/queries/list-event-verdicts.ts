import "server-only";
import { and, eq, gt } from "drizzle-orm";
import { parseStoredVerdict } from "../../lib/entries/parse-stored-verdict";
import { toPackVerdict } from "../../lib/tech/to-pack-verdict";
import { getDb } from "../client";
import { verdicts } from "../schema";

/** The stored verdicts of an event (only those computed after `since`, if given), in the short
 *  form phones and boards use. A row whose JSON does not read as a verdict is left out (no
 *  verdict: the car shows as Waiting) and logged. */
export async function listEventVerdicts({
  eventId,
  since,
}: {
  eventId: string;
  since?: Date | null;
}) {
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
    .where(
      since
        ? and(eq(verdicts.eventId, eventId), gt(verdicts.computedAt, since))
        : eq(verdicts.eventId, eventId),
    );
  return rows.flatMap((r) => {
    const verdict = parseStoredVerdict({ entryId: r.entryId, result: r.result });
    if (!verdict) return [];
    return [
      toPackVerdict({
        entryId: r.entryId,
        verdict: { ...verdict, status: r.status, classId: r.classId, reason: r.reason },
        computedAt: r.computedAt,
      }),
    ];
  });
}
