import "server-only";
import { asc, eq } from "drizzle-orm";
import type { StoredSessionCall } from "../../../lib/paddock/calls-on-sheet";
import { getDb } from "../../client";
import { sessionCalls } from "../../schema";

/** Every mark the clerk of course made on the event's sessions, oldest first. */
export async function listSessionCalls({
  eventId,
}: {
  eventId: string;
}): Promise<StoredSessionCall[]> {
  const rows = await getDb()
    .select({
      sessionKey: sessionCalls.sessionKey,
      groupName: sessionCalls.groupName,
      round: sessionCalls.round,
      state: sessionCalls.state,
      at: sessionCalls.calledAt,
      note: sessionCalls.note,
    })
    .from(sessionCalls)
    .where(eq(sessionCalls.eventId, eventId))
    .orderBy(asc(sessionCalls.calledAt), asc(sessionCalls.id));
  return rows.map((r) => ({ ...r, at: r.at.toISOString() }));
}
