import type { OverridePayload } from "../records/record-schema";
import type { RuleSet } from "../rule-sets/rule-set-schema";
import { overrideTargetProblem } from "./override-target-problem";

type ClassRef = Pick<RuleSet["classes"][number], "id" | "name">;

/**
 * The classes a chief scrutineer's decision can name, by {@link overrideTargetProblem}: the
 * declared class for "cleared", the classes above it for "moved-up", none for "held".
 */
export function overrideClassChoices<C extends ClassRef>(args: {
  classes: ReadonlyArray<C>;
  declaredClassId: string;
  status: OverridePayload["status"];
}): C[] {
  if (args.status === "held") return [];
  return args.classes.filter(
    (c) =>
      overrideTargetProblem({
        classes: args.classes,
        declaredClassId: args.declaredClassId,
        status: args.status,
        classId: c.id,
      }) === null,
  );
}
