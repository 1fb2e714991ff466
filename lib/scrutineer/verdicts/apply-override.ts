import { overrideTargetProblem } from "../classes/override-target-problem";
import type { TechRecordOf } from "../records/record-schema";
import type { RuleSet } from "../rule-sets/rule-set-schema";
import type { SettledVerdict } from "./settle-verdict";
import type { Verdict } from "./verdict-schema";

/** The verdict after the chief scrutineer's override, or the computed one when there is none. */
export type Overridden = SettledVerdict & {
  override: Verdict["override"];
  rejectedOverride: Verdict["rejectedOverride"];
};

/**
 * Applies the latest effective override: it sets the final status and class, and the reason
 * says it is the chief scrutineer's decision and why (who decided stays in `override.officialId`,
 * never in the words); the computed result stays alongside. An override that does not fit the
 * rule set and the declared class ({@link overrideTargetProblem}) is ignored and returned as
 * `rejectedOverride` with the reason in words.
 */
export function applyOverride(args: {
  computed: SettledVerdict;
  override: TechRecordOf<"override"> | null;
  ruleSet: RuleSet;
  declaredClassId: string;
}): Overridden {
  const { computed, override, ruleSet } = args;
  if (override === null) return { ...computed, override: null, rejectedOverride: null };
  const p = override.payload;
  const problem = overrideTargetProblem({
    classes: ruleSet.classes,
    declaredClassId: args.declaredClassId,
    status: p.status,
    classId: p.classId,
  });
  if (problem !== null) {
    return {
      ...computed,
      override: null,
      rejectedOverride: {
        recordId: override.id,
        officialId: override.officialId,
        deviceTime: override.deviceTime,
        status: p.status,
        classId: p.classId,
        problem,
      },
    };
  }
  const name = ruleSet.classes.find((c) => c.id === p.classId)?.name ?? "";
  const decision =
    p.status === "held"
      ? "held"
      : p.status === "cleared"
        ? `cleared in ${name}`
        : `moves up to ${name}`;
  const reason = withoutTrailingStops(p.reason);
  return {
    status: p.status,
    classId: p.classId,
    fallbackClassId: null,
    reason: `Chief scrutineer's decision: ${decision} — ${reason}.`,
    override: {
      recordId: override.id,
      officialId: override.officialId,
      deviceTime: override.deviceTime,
      reason: p.reason,
      computedStatus: computed.status,
      computedClassId: computed.classId,
      computedReason: computed.reason,
    },
    rejectedOverride: null,
  };
}

/** The reason without its closing full stops and spaces (a loop: a regex anchored at the end
 * would retry from every space of a long run of them, quadratic in the length). */
function withoutTrailingStops(text: string): string {
  let end = text.length;
  while (end > 0 && /[.\s]/.test(text.charAt(end - 1))) end -= 1;
  return text.slice(0, end).trimStart();
}
