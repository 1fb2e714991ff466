import type { Drive } from "../paddock/drive";
import type { RunGroup } from "../paddock/run-group-plan";

/**
 * What stops a draft from being published, in words: a drive in a group whose car is not ready
 * to run (held, waiting, not signed on, withdrawn), a drive placed twice, a ready drive in no
 * group. Only ready cars can be published. Pure.
 */
export function publishProblems({
  drives,
  groups,
  carNumbers,
}: {
  drives: Drive[];
  groups: RunGroup[];
  /** Car numbers of the event's entries (not withdrawn), by entry id. */
  carNumbers: Map<string, number>;
}): string[] {
  const label = (drive: Drive | undefined, driveId: string) => {
    if (drive) return `car ${drive.carNumber} (${drive.driverName})`;
    const number = carNumbers.get(driveId.split(":")[0] ?? "");
    return number === undefined ? "a withdrawn car" : `car ${number}`;
  };
  const ready = new Map(drives.map((d) => [d.driveId, d]));
  const seen = new Set<string>();
  const problems: string[] = [];
  const notReady: string[] = [];
  for (const group of groups) {
    for (const id of group.driveIds) {
      if (seen.has(id)) problems.push(`${label(ready.get(id), id)} is in two groups.`);
      seen.add(id);
      if (!ready.has(id)) notReady.push(`${group.name}: ${label(undefined, id)}`);
    }
  }
  if (notReady.length > 0) {
    problems.push(
      `Only cars ready to run can be published; take these out first (${notReady.join("; ")}).`,
    );
  }
  const left = drives.filter((d) => !seen.has(d.driveId));
  if (left.length > 0) {
    problems.push(
      `Ready to run but in no group: ${left.map((d) => label(d, d.driveId)).join(", ")}. Build again or move them into a group.`,
    );
  }
  return problems;
}
