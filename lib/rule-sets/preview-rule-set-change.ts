import "server-only";
import { getEventRuleSet } from "../../db/queries/get-event-rule-set";
import { listEventEntries } from "../../db/queries/list-event-entries";
import { AppError } from "../errors";
import type { RuleSet } from "../scrutineer/rule-sets/rule-set-schema";
import { type ReEvaluation, reEvaluateEntries } from "../scrutineer/verdicts/re-evaluate-entries";
import { loadEvaluationEntries } from "../tech/load-evaluation-entries";

/** A re-evaluation with each changed entry's car number, for the organizer's page. */
export type RuleSetChangePreview = ReEvaluation & {
  carNumbers: Record<string, number>;
  classNames: Record<string, string>;
};

/**
 * What would change if the event judged its cars by `candidate` instead of its pinned rule set:
 * every verdict that changes and why, from the same records the server's verdicts come from.
 * Nothing is stored.
 */
export async function previewRuleSetChange({
  eventId,
  candidate,
}: {
  eventId: string;
  candidate: RuleSet;
}): Promise<RuleSetChangePreview> {
  const context = await getEventRuleSet({ eventId });
  if (!context) throw new AppError("not_found", "No such event.");
  const [inputs, rows] = await Promise.all([
    loadEvaluationEntries({ context }),
    listEventEntries({ eventId }),
  ]);
  const carNumbers = Object.fromEntries(rows.map((r) => [r.entryId, r.carNumber]));
  const live = inputs.filter((i) => i.entry.entryId in carNumbers);
  const reEvaluation = reEvaluateEntries({
    before: context.ruleSet,
    after: candidate,
    entries: live,
  });
  const classNames = Object.fromEntries(
    [...context.ruleSet.classes, ...candidate.classes].map((c) => [c.id, c.name]),
  );
  reEvaluation.changed.sort((a, b) => (carNumbers[a.entryId] ?? 0) - (carNumbers[b.entryId] ?? 0));
  return { ...reEvaluation, carNumbers, classNames };
}
