import type { VerdictChange } from "./recompute-verdicts";

/**
 * Whether a recomputed verdict differs from the stored one in status or class. An entry with no
 * stored verdict was Waiting, so a new Waiting verdict is no change.
 */
export function verdictMoved({
  before,
  verdict,
}: Pick<VerdictChange, "before" | "verdict">): boolean {
  if (before === null) return verdict.status !== "waiting";
  return before.status !== verdict.status || before.finalClass !== verdict.classId;
}
