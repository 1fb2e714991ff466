import type { RuleSetIssue } from "./parse-rule-set-json";
import type { RuleSet } from "./rule-set-schema";

/**
 * What a new version of a rule set must keep from the one an event has pinned: the same rule-set
 * id, the next version number, and every class an entry has declared (an entry cannot be judged
 * in a class that no longer exists). Returns the problems, none when it may be saved.
 * @param latestVersion the highest version saved so far (pinned or not)
 * @param declaredClassIds the classes the event's entries declared, with how many declared each
 */
export function checkRuleSetSuccessor(args: {
  pinned: RuleSet;
  next: RuleSet;
  latestVersion: number;
  declaredClassIds: ReadonlyMap<string, number>;
}): RuleSetIssue[] {
  const { pinned, next, latestVersion } = args;
  const issues: RuleSetIssue[] = [];
  if (next.id !== pinned.id) {
    issues.push({
      path: "id",
      where: "id",
      message: `This event's rule set is "${pinned.id}"; a new version keeps that id.`,
    });
  }
  if (next.version !== latestVersion + 1) {
    issues.push({
      path: "version",
      where: "version",
      message: `The next version of this rule set is ${latestVersion + 1}.`,
    });
  }
  const kept = new Set(next.classes.map((c) => c.id));
  for (const [classId, count] of args.declaredClassIds) {
    if (kept.has(classId)) continue;
    const name = pinned.classes.find((c) => c.id === classId)?.name ?? classId;
    issues.push({
      path: "classes",
      where: "classes",
      message: `${count} ${count === 1 ? "entry declares" : "entries declare"} ${name} ("${classId}"); keep that class.`,
    });
  }
  return issues;
}
