import "server-only";
import { eq } from "drizzle-orm";
import { getDb } from "../client";
import { verdicts } from "../schema";

/** The stored verdicts of an event whole (the result JSON as the driver hands it over, unread),
 *  with when each was computed. Callers read `result` through `parseStoredVerdict`. */
export async function listEventVerdictResults({ eventId }: { eventId: string }) {
  return getDb()
    .select({ entryId: verdicts.entryId, result: verdicts.result, computedAt: verdicts.computedAt })
    .from(verdicts)
    .where(eq(verdicts.eventId, eventId));
}
