import type { RuleResult } from "../verdicts/verdict-schema";
import type { ClassRules } from "./class-rules-schema";
import type { LadderWalk } from "./walk-class-ladder";

/** Ends a rule's reason with what follows from it when no ladder is involved (event and safety rules). */
export function finishStandaloneReason(reason: string, outcome: RuleResult["outcome"]): string {
  if (outcome === "fail") return `${reason} — held: fix and re-present.`;
  if (outcome === "inconclusive") return `${reason} — re-measure or ask the chief scrutineer.`;
  return `${reason}.`;
}

/**
 * Ends every class rule's reason with its consequence on the ladder, e.g.
 * "…; over by 2 mm — moves up to Merlin.", "… — held: fix and re-present.",
 * "… — re-measure or ask the chief scrutineer."
 */
export function finishRuleReasons(
  walk: LadderWalk,
  classes: ReadonlyArray<ClassRules>,
): LadderWalk["checks"] {
  return walk.checks.map((check, i) => {
    const landingOffset = walk.checks.findIndex((c, j) => j > i && c.fit !== "over");
    const landing = landingOffset < 0 ? null : walk.checks[landingOffset];
    const landingName = landing === null || landing === undefined ? null : landing.className;
    const beyondTop = walk.declaredIndex + i >= classes.length - 1;
    const rules = check.rules.map((rule) => {
      let suffix = ".";
      if (rule.outcome === "inconclusive") suffix = " — re-measure or ask the chief scrutineer.";
      else if (rule.outcome === "fail") {
        if (rule.onFail === "stop") suffix = " — held: fix and re-present.";
        else if (landing !== null && landing !== undefined) {
          suffix =
            landing.fit === "fits"
              ? ` — moves up to ${landingName}.`
              : ` — out of ${check.className}; ${landingName} still to settle.`;
        } else if (walk.end.kind === "exhausted" || beyondTop) {
          suffix = " — over every class's limits: held, fix and re-present.";
        } else suffix = ` — out of ${check.className}.`;
      }
      return { ...rule, reason: `${rule.reason}${suffix}` };
    });
    return { ...check, rules };
  });
}
