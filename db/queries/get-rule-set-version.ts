import "server-only";
import { and, eq } from "drizzle-orm";
import { getDb } from "../client";
import { events, ruleSetVersions } from "../schema";

/**
 * One saved version of the rule set an event pins, with its stored JSON, or null when the version
 * belongs to another rule set (or does not exist).
 */
export async function getRuleSetVersion({
  eventId,
  versionId,
}: {
  eventId: string;
  versionId: string;
}): Promise<{ id: string; version: number; body: unknown; lockedAt: Date | null } | null> {
  const db = getDb();
  const [event] = await db
    .select({ ruleSetId: ruleSetVersions.ruleSetId })
    .from(events)
    .innerJoin(ruleSetVersions, eq(ruleSetVersions.id, events.ruleSetVersionId))
    .where(eq(events.id, eventId))
    .limit(1);
  if (!event) return null;
  const [row] = await db
    .select({
      id: ruleSetVersions.id,
      version: ruleSetVersions.version,
      body: ruleSetVersions.body,
      lockedAt: ruleSetVersions.lockedAt,
    })
    .from(ruleSetVersions)
    .where(and(eq(ruleSetVersions.id, versionId), eq(ruleSetVersions.ruleSetId, event.ruleSetId)))
    .limit(1);
  return row ?? null;
}
