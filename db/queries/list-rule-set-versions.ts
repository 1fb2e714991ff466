import "server-only";
import { desc, eq } from "drizzle-orm";
import { getDb } from "../client";
import { events, ruleSetVersions, users } from "../schema";

/** A saved version of the event's rule set, newest first; `pinned` is the one the event uses. */
export type RuleSetVersionRow = {
  id: string;
  version: number;
  notes: string | null;
  createdAt: Date;
  createdByName: string | null;
  lockedAt: Date | null;
  pinned: boolean;
};

/** Every saved version of the rule set an event pins, newest first (empty for an unknown event). */
export async function listRuleSetVersions({
  eventId,
}: {
  eventId: string;
}): Promise<RuleSetVersionRow[]> {
  const db = getDb();
  const [event] = await db
    .select({ ruleSetId: ruleSetVersions.ruleSetId, pinnedId: events.ruleSetVersionId })
    .from(events)
    .innerJoin(ruleSetVersions, eq(ruleSetVersions.id, events.ruleSetVersionId))
    .where(eq(events.id, eventId))
    .limit(1);
  if (!event) return [];
  const rows = await db
    .select({
      id: ruleSetVersions.id,
      version: ruleSetVersions.version,
      notes: ruleSetVersions.notes,
      createdAt: ruleSetVersions.createdAt,
      createdByName: users.name,
      createdByEmail: users.email,
      lockedAt: ruleSetVersions.lockedAt,
    })
    .from(ruleSetVersions)
    .leftJoin(users, eq(users.id, ruleSetVersions.createdBy))
    .where(eq(ruleSetVersions.ruleSetId, event.ruleSetId))
    .orderBy(desc(ruleSetVersions.version));
  return rows.map(({ createdByEmail, ...row }) => ({
    ...row,
    createdByName: row.createdByName ?? createdByEmail,
    pinned: row.id === event.pinnedId,
  }));
}
