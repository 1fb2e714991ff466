import type { Verdict } from "../scrutineer/verdicts/verdict-schema";

/**
 * Whether a verdict waits for the chief scrutineer: readings that disagree beyond their combined
 * uncertainty, an override that no longer fits the rule set, a checklist answer for an item the
 * rule set does not have, voids in a loop, a reading outside what a car can measure, or a verdict
 * the server could not compute, or a car sent back for re-inspection. Code surfaces these; it does not resolve them. A standing
 * override (flag "overridden") is the chief's decision and settles the car.
 */
export function needsChiefScrutineer(verdict: Pick<Verdict, "flags">): boolean {
  // A re-inspection is closed by the chief scrutineer, override or not.
  if (verdict.flags.includes("reinspection")) return true;
  if (verdict.flags.includes("overridden")) return false;
  return verdict.flags.some(
    (f) =>
      f === "disagreement" ||
      f === "override-invalid" ||
      f === "unknown-checklist-item" ||
      f === "void-cycle" ||
      f === "implausible-reading" ||
      f === "not-computed",
  );
}
