import type { OverridePayload } from "../records/record-schema";
import type { RuleSet } from "../rule-sets/rule-set-schema";

type ClassRef = Pick<RuleSet["classes"][number], "id" | "name">;

/**
 * Whether a chief scrutineer's decision fits the rule set and the class the car was entered in:
 * a held car runs in no class, a cleared car stays in its declared class, a moved-up car goes to
 * a class above it. The engine ignores (and flags) an override that does not fit; the chief's
 * form checks with this same rule before saving.
 * @param classes the rule set's class ladder, low → high
 * @returns null when the decision fits, else one sentence saying why it does not
 */
export function overrideTargetProblem(args: {
  classes: ReadonlyArray<ClassRef>;
  declaredClassId: string;
  status: OverridePayload["status"];
  classId: string | null;
}): string | null {
  const { classes, declaredClassId, status, classId } = args;
  if (status === "held") return classId === null ? null : "A held car runs in no class.";
  if (classId === null) return "Choose the class the car runs in.";
  const index = classes.findIndex((c) => c.id === classId);
  const declaredIndex = classes.findIndex((c) => c.id === declaredClassId);
  const chosen = classes[index];
  if (chosen === undefined) return `There is no class "${classId}" in this event's class rules.`;
  const declaredName = classes[declaredIndex]?.name ?? declaredClassId;
  if (index < declaredIndex) {
    return `${chosen.name} is below ${declaredName}, the class this car was entered in: a car is cleared in its own class or moved up, never down.`;
  }
  if (status === "cleared" && index > declaredIndex) {
    return `To put this car in ${chosen.name}, choose "Moved up": a car is cleared in the class it was entered in (${declaredName}).`;
  }
  if (status === "moved-up" && index === declaredIndex) {
    return `${chosen.name} is the class this car was entered in: choose "Cleared" to keep it there, or a higher class to move it up.`;
  }
  return null;
}
