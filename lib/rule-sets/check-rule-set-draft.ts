import "server-only";
import { countDeclaredClasses } from "../../db/queries/count-declared-classes";
import { getEventRuleSet } from "../../db/queries/get-event-rule-set";
import { listRuleSetVersions } from "../../db/queries/list-rule-set-versions";
import { AppError } from "../errors";
import { checkRuleSetSuccessor } from "../scrutineer/rule-sets/check-rule-set-successor";
import { parseRuleSetJson, type RuleSetIssue } from "../scrutineer/rule-sets/parse-rule-set-json";
import type { RuleSet } from "../scrutineer/rule-sets/rule-set-schema";

/** A draft that passed every check, or the problems with their places. */
export type RuleSetDraftCheck =
  | { ok: true; ruleSet: RuleSet }
  | { ok: false; issues: RuleSetIssue[] };

/**
 * Checks the JSON an organizer wrote as the next version of the event's rule set: the schema
 * (field by field), then what a successor must keep (same id, next version number, every class an
 * entry declared).
 */
export async function checkRuleSetDraft({
  eventId,
  text,
}: {
  eventId: string;
  text: string;
}): Promise<RuleSetDraftCheck> {
  const parsed = parseRuleSetJson(text);
  if (!parsed.ok) return { ok: false, issues: parsed.issues };
  const [context, versions, declared] = await Promise.all([
    getEventRuleSet({ eventId }),
    listRuleSetVersions({ eventId }),
    countDeclaredClasses({ eventId }),
  ]);
  if (!context) throw new AppError("not_found", "No such event.");
  const issues = checkRuleSetSuccessor({
    pinned: context.ruleSet,
    next: parsed.ruleSet,
    latestVersion: versions[0]?.version ?? context.ruleSet.version,
    declaredClassIds: declared,
  });
  if (issues.length > 0) return { ok: false, issues };
  return { ok: true, ruleSet: parsed.ruleSet };
}
