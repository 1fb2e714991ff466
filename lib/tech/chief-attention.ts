import type { VerdictFlag, VerdictStatus } from "../scrutineer/verdict-schema";

/**
 * Why a car waits for the chief scrutineer, in words a person can act on, most pressing first:
 * an override that was not applied, readings that disagree, a reading too close to call, voids
 * that cancel each other, an answer for an item the rules lack, copies of a record that differ,
 * a held car, or a re-measure still owed. Empty when nothing asks for the chief, and when the
 * chief's own override stands (flag "overridden"): their decision settles the car.
 * @param rejectedOverride the override the engine could not apply: who and when, and why not
 */
export function chiefAttention(verdict: {
  status: VerdictStatus;
  flags: ReadonlyArray<string>;
  rejectedOverride: { whoAndWhen: string; problem: string } | null;
}): string[] {
  const has = (flag: VerdictFlag) => verdict.flags.includes(flag);
  if (has("overridden")) return [];
  const words: string[] = [];
  if (has("override-invalid")) {
    words.push(
      verdict.rejectedOverride
        ? `Override not applied — saved by ${verdict.rejectedOverride.whoAndWhen}: ${verdict.rejectedOverride.problem} The computed verdict stands until you save one that fits or void it.`
        : "An override does not fit the class rules and was not applied: the computed verdict stands.",
    );
  }
  if (has("disagreement")) {
    words.push(
      "Readings disagree: two officials' readings differ by more than their combined uncertainty. Void the one you reject, or have the car re-measured.",
    );
  }
  if (has("inconclusive")) {
    words.push(
      "Too close to call: a reading is within its uncertainty of a limit. Have it re-measured, or decide.",
    );
  }
  if (has("void-cycle")) {
    words.push("Voids cancel each other in a loop and were ignored: void the wrong void.");
  }
  if (has("unknown-checklist-item")) {
    words.push("A checklist answer names an item these class rules do not have.");
  }
  if (has("duplicate-record")) {
    words.push("Two copies of one record differ: one was used; check the phone that sent them.");
  }
  if (verdict.status === "held" && !has("overridden")) {
    words.push(
      "Held: the car may not run until it is fixed and presented again, or you decide otherwise.",
    );
  }
  if (verdict.status === "re-measure" && !has("disagreement") && !has("inconclusive")) {
    words.push("Waiting for a re-measure.");
  }
  return words;
}
