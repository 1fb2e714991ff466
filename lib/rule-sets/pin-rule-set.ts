import "server-only";
import { countDeclaredClasses } from "../../db/queries/count-declared-classes";
import { getRuleSetVersion } from "../../db/queries/get-rule-set-version";
import { pinRuleSetVersion } from "../../db/queries/pin-rule-set-version";
import { clock } from "../clock";
import { AppError } from "../errors";
import { ruleSetSchema } from "../scrutineer/rule-sets/rule-set-schema";
import { recomputeVerdicts } from "../tech/recompute-verdicts";
import { verdictMoved } from "../tech/verdict-moved";

/**
 * Judge the event's cars by another saved version of its rule set: pin it (locking it for good),
 * recompute every verdict from the records, and queue e-mails to the drivers whose verdict changed
 * (the worker sends them).
 * Refused when an entry's declared class is missing from that version.
 */
export async function pinRuleSet({
  eventId,
  versionId,
  userId,
  now = clock.now(),
}: {
  eventId: string;
  versionId: string;
  userId: string;
  now?: Date;
}): Promise<{ version: number; previousVersion: number | null; changed: number; mailed: number }> {
  const stored = await getRuleSetVersion({ eventId, versionId });
  if (!stored) throw new AppError("not_found", "That is not a version of this event's rule set.");
  const ruleSet = ruleSetSchema.parse(stored.body);
  const kept = new Set(ruleSet.classes.map((c) => c.id));
  const missing = [...(await countDeclaredClasses({ eventId })).keys()].filter(
    (id) => !kept.has(id),
  );
  if (missing.length > 0) {
    throw new AppError(
      "conflict",
      `Entries declare ${missing.join(", ")}, which version ${ruleSet.version} does not have.`,
    );
  }
  const pinned = await pinRuleSetVersion({ eventId, versionId, pinnedBy: userId, now });
  if (pinned.previousVersion === null) return { ...pinned, changed: 0, mailed: 0 };
  const { changes, mailsQueued } = await recomputeVerdicts({ eventId, now });
  const changed = changes.filter(verdictMoved).length;
  return { ...pinned, changed, mailed: mailsQueued };
}
