import type { VerdictFlag, VerdictStatus } from "../scrutineer/verdicts/verdict-schema";

/**
 * Why a car waits for the chief scrutineer, in words a person can act on, most pressing first:
 * a verdict the server could not compute, an override that was not applied, readings that
 * disagree, a reading that cannot plausibly be true, a reading too close to call, voids that
 * cancel each other, an answer for an item the rules lack, copies of a record that differ, a held
 * car, or a re-measure still owed. Empty when nothing asks for the chief, and when the chief's
 * own override stands (flag "overridden"): their decision settles the car.
 * @param rejectedOverride the override the engine could not apply: who and when, and why not
 * @param implausibleReadings why each implausible reading cannot be true (the verdict's
 *   `implausibleReadings[].why`); without them the flag is named in general words
 */
export function chiefAttention(verdict: {
  status: VerdictStatus;
  flags: ReadonlyArray<string>;
  rejectedOverride: { whoAndWhen: string; problem: string } | null;
  implausibleReadings?: ReadonlyArray<string>;
}): string[] {
  const has = (flag: VerdictFlag) => verdict.flags.includes(flag);
  if (has("overridden")) return [];
  const words: string[] = [];
  if (has("not-computed")) {
    words.push(
      "The server could not compute this car's verdict: it waits until you decide. Tell the organizer so the fault is fixed.",
    );
  }
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
  if (has("implausible-reading")) {
    const why = verdict.implausibleReadings ?? [];
    if (why.length === 0) {
      words.push(
        "Check this reading: one of this car's readings is outside what a car at the tech line measures. Open the car card, then void it or have the car re-measured.",
      );
    }
    for (const w of why) {
      words.push(`Check this reading: ${w}. Void it or have the car re-measured.`);
    }
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
