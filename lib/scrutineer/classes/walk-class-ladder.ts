import type { ClassCheck } from "../verdicts/verdict-schema";
import type { ClassRules } from "./class-rules-schema";

/** Where the walk up the ladder ended. */
export type LadderEnd =
  | { kind: "fits" | "unsure" | "incomplete"; classIndex: number }
  | { kind: "stopped"; classIndex: number }
  | { kind: "exhausted" };

/** The classes checked, in ladder order from the declared class, and where the walk ended. */
export type LadderWalk = {
  /** Index into the rule set's classes of checks[0]; checks[i] is class declaredIndex + i. */
  declaredIndex: number;
  checks: ClassCheck[];
  end: LadderEnd;
  /** When the walk ended unsure: the class the car lands in if the doubt proves over. */
  fallbackClassIndex: number | null;
};

function stoppedBy(check: ClassCheck): boolean {
  return check.rules.some((r) => r.outcome === "fail" && r.onFail === "stop");
}

/**
 * Walks the ladder from the declared class upward: a class the car is over (and where every
 * failure is a move-up kind) sends it to the next; the first class it is not over ends the walk.
 * A failure of a "stop" kind ends it held; running off the top ends it held too. When the walk
 * ends unsure, it carries on as if the doubt were over, to name the fallback class.
 * @param check checks one class (called once per class visited, at most the ladder's length)
 */
export function walkClassLadder(
  classes: ReadonlyArray<ClassRules>,
  declaredIndex: number,
  check: (cls: ClassRules) => ClassCheck,
): LadderWalk {
  const checks: ClassCheck[] = [];
  let end: LadderEnd = { kind: "exhausted" };
  let fallbackClassIndex: number | null = null;
  let i = declaredIndex;
  for (; i < classes.length; i += 1) {
    const cls = classes[i];
    if (cls === undefined) break;
    const result = check(cls);
    checks.push(result);
    if (result.fit === "over") {
      if (stoppedBy(result)) {
        end = { kind: "stopped", classIndex: i };
        break;
      }
      continue;
    }
    end = { kind: result.fit, classIndex: i };
    break;
  }
  if (end.kind === "unsure") {
    for (let j = end.classIndex + 1; j < classes.length; j += 1) {
      const cls = classes[j];
      if (cls === undefined) break;
      const result = check(cls);
      checks.push(result);
      if (result.fit === "over" && !stoppedBy(result)) continue;
      if (result.fit === "fits") fallbackClassIndex = j;
      break;
    }
  }
  return { declaredIndex, checks, end, fallbackClassIndex };
}
