import "server-only";
import { eq, max } from "drizzle-orm";
import { v7 as uuidv7 } from "uuid";
import { clock } from "../../lib/clock";
import { AppError } from "../../lib/errors";
import type { RuleSet } from "../../lib/scrutineer/rule-sets/rule-set-schema";
import { getDb } from "../client";
import { auditLog, events, ruleSets, ruleSetVersions } from "../schema";

/**
 * Save a new version of the rule set an event pins: the validated rule set with its defaults
 * filled in, so the stored version means the same whatever later schema defaults become. Versions are append-only: nothing here changes a saved version. The rule set's row
 * is locked so two organizers saving at once cannot both take the same number.
 * @throws AppError conflict when `ruleSet.version` is not the next number (someone saved first)
 */
export async function insertRuleSetVersion({
  eventId,
  ruleSet,
  notes,
  createdBy,
  now = clock.now(),
}: {
  eventId: string;
  ruleSet: RuleSet;
  notes: string;
  createdBy: string;
  now?: Date;
}): Promise<{ id: string; version: number }> {
  return getDb().transaction(async (tx) => {
    const [event] = await tx
      .select({ ruleSetId: ruleSetVersions.ruleSetId })
      .from(events)
      .innerJoin(ruleSetVersions, eq(ruleSetVersions.id, events.ruleSetVersionId))
      .where(eq(events.id, eventId))
      .limit(1);
    if (!event) throw new AppError("not_found", "No such event.");
    await tx
      .select({ id: ruleSets.id })
      .from(ruleSets)
      .where(eq(ruleSets.id, event.ruleSetId))
      .for("update");
    const [latest] = await tx
      .select({ version: max(ruleSetVersions.version) })
      .from(ruleSetVersions)
      .where(eq(ruleSetVersions.ruleSetId, event.ruleSetId));
    const next = (latest?.version ?? 0) + 1;
    if (ruleSet.version !== next) {
      throw new AppError("conflict", `Version ${ruleSet.version} is taken; save it as ${next}.`, {
        version: [`The next version of this rule set is ${next}.`],
      });
    }
    const id = uuidv7();
    await tx.insert(ruleSetVersions).values({
      id,
      ruleSetId: event.ruleSetId,
      version: next,
      body: ruleSet,
      notes,
      createdBy,
      createdAt: now,
    });
    await tx.insert(auditLog).values({
      eventId,
      actorId: createdBy,
      action: "rule-set.save",
      subjectType: "rule-set-version",
      subjectId: id,
      detail: { version: next, notes },
      createdAt: now,
    });
    return { id, version: next };
  });
}
