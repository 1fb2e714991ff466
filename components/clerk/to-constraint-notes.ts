import type { RunGroupsCheck } from "@/lib/paddock/check-run-groups";
import type { ConstraintNote } from "./clerk-view-models";

/** checkRunGroups' findings as the page lists them: blocking hard rules first, then hard rules
 *  that had to give way with this many groups, then preferences. */
export function toConstraintNotes(check: RunGroupsCheck): ConstraintNote[] {
  const hard = check.hard.map((g) => ({
    rule: g.rule,
    text: g.text,
    driveIds: g.driveIds,
    kind: g.severity === "blocks" ? ("blocks" as const) : ("gave-way" as const),
  }));
  const soft = check.soft.map((g) => ({
    rule: g.rule,
    text: g.text,
    driveIds: g.driveIds,
    kind: "soft" as const,
  }));
  return [
    ...hard.filter((n) => n.kind === "blocks"),
    ...hard.filter((n) => n.kind === "gave-way"),
    ...soft,
  ];
}
