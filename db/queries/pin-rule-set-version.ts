import "server-only";
import { and, eq, isNull } from "drizzle-orm";
import { clock } from "../../lib/clock";
import { AppError } from "../../lib/errors";
import { getDb } from "../client";
import { auditLog, events, ruleSetVersions } from "../schema";

/**
 * Make a saved version the one the event judges cars by, in one transaction: the version is
 * locked (never changed again), the event points at it, and an audit-log row says who did it and
 * which version it replaced. The caller recomputes the verdicts afterwards.
 * @returns the version number pinned before, or null when this version was already pinned
 */
export async function pinRuleSetVersion({
  eventId,
  versionId,
  pinnedBy,
  now = clock.now(),
}: {
  eventId: string;
  versionId: string;
  pinnedBy: string;
  now?: Date;
}): Promise<{ previousVersion: number | null; version: number }> {
  return getDb().transaction(async (tx) => {
    const [event] = await tx
      .select({ pinnedId: events.ruleSetVersionId })
      .from(events)
      .where(eq(events.id, eventId))
      .for("update");
    if (!event) throw new AppError("not_found", "No such event.");
    const [pinned] = await tx
      .select({ ruleSetId: ruleSetVersions.ruleSetId, version: ruleSetVersions.version })
      .from(ruleSetVersions)
      .where(eq(ruleSetVersions.id, event.pinnedId))
      .limit(1);
    const [target] = await tx
      .select({ ruleSetId: ruleSetVersions.ruleSetId, version: ruleSetVersions.version })
      .from(ruleSetVersions)
      .where(eq(ruleSetVersions.id, versionId))
      .limit(1);
    if (!pinned || !target || target.ruleSetId !== pinned.ruleSetId) {
      throw new AppError("not_found", "That version is not a version of this event's rule set.");
    }
    if (event.pinnedId === versionId) return { previousVersion: null, version: target.version };
    await tx
      .update(ruleSetVersions)
      .set({ lockedAt: now })
      .where(and(eq(ruleSetVersions.id, versionId), isNull(ruleSetVersions.lockedAt)));
    await tx
      .update(events)
      .set({ ruleSetVersionId: versionId, updatedAt: now })
      .where(eq(events.id, eventId));
    await tx.insert(auditLog).values({
      eventId,
      actorId: pinnedBy,
      action: "rule-set.pin",
      subjectType: "rule-set-version",
      subjectId: versionId,
      detail: { version: target.version, previousVersion: pinned.version },
      createdAt: now,
    });
    return { previousVersion: pinned.version, version: target.version };
  });
}
