import "server-only";
import { and, asc, eq, isNotNull } from "drizzle-orm";
import { getDb } from "../client";
import { passes } from "../schema";

/**
 * Ids (the `jti` claim) of every revoked pass of the event, for the event pack. Expired ones are
 * kept on purpose: a phone whose clock runs slow would otherwise still take them.
 */
export async function listRevokedPassIds({ eventId }: { eventId: string }): Promise<string[]> {
  const rows = await getDb()
    .select({ id: passes.id })
    .from(passes)
    .where(and(eq(passes.eventId, eventId), isNotNull(passes.revokedAt)))
    .orderBy(asc(passes.id));
  return rows.map((r) => r.id);
}
