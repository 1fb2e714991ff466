import type { TechRecordOf } from "./record-schema";
import type { RuleSet } from "./rule-set-schema";
import type { SettledVerdict } from "./settle-verdict";
import type { Verdict } from "./verdict-schema";

/** The verdict after the chief scrutineer's override, or the computed one when there is none. */
export type Overridden = SettledVerdict & { override: Verdict["override"]; invalid: boolean };

/**
 * Applies the latest effective override: it sets the final status and class, and the reason
 * says it is the chief scrutineer's decision and why (who decided stays in `override.officialId`,
 * never in the words); the computed result stays alongside. An override naming an unknown
 * class, or "moved-up" to a class not above the declared one, is ignored (and flagged).
 */
export function applyOverride(args: {
  computed: SettledVerdict;
  override: TechRecordOf<"override"> | null;
  ruleSet: RuleSet;
  declaredClassId: string;
}): Overridden {
  const { computed, override, ruleSet } = args;
  if (override === null) return { ...computed, override: null, invalid: false };
  const p = override.payload;
  const index = p.classId === null ? -1 : ruleSet.classes.findIndex((c) => c.id === p.classId);
  const declaredIndex = ruleSet.classes.findIndex((c) => c.id === args.declaredClassId);
  const valid =
    p.status === "held"
      ? p.classId === null
      : index >= 0 && (p.status === "cleared" || index > declaredIndex);
  if (!valid) return { ...computed, override: null, invalid: true };
  const name = ruleSet.classes[index]?.name ?? "";
  const decision =
    p.status === "held"
      ? "held"
      : p.status === "cleared"
        ? `cleared in ${name}`
        : `moves up to ${name}`;
  const reason = p.reason.trim().replace(/[.\s]+$/, "");
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
    invalid: false,
  };
}
