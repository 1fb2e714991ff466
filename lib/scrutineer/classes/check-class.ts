import { checkAeroRules } from "../aero/check-aero-rules";
import { checkPowerToWeight } from "../power-to-weight/check-power-to-weight";
import type { ClassCheckContext } from "../power-to-weight/class-check-context";
import type { ClassCheck, RuleResult } from "../verdicts/verdict-schema";
import { checkDeclaredRules } from "./check-declared-rules";
import type { ClassRules } from "./class-rules-schema";

/** How a class fits from its rule results: any fail → over; any doubt → unsure; any gap → incomplete. */
export function classFit(rules: ReadonlyArray<RuleResult>): ClassCheck["fit"] {
  if (rules.some((r) => r.outcome === "fail")) return "over";
  if (rules.some((r) => r.outcome === "inconclusive")) return "unsure";
  if (rules.some((r) => r.outcome === "waiting")) return "incomplete";
  return "fits";
}

/**
 * Checks every rule of one class — aero, power-to-weight and declared limits — against the
 * entry's readings and declarations.
 */
export function checkClass(cls: ClassRules, ctx: ClassCheckContext): ClassCheck {
  const ptw = checkPowerToWeight(cls, ctx);
  const rules = [
    ...checkAeroRules(cls, ctx),
    ...(ptw === null ? [] : [ptw]),
    ...checkDeclaredRules(cls, ctx),
  ];
  return { classId: cls.id, className: cls.name, fit: classFit(rules), rules };
}
