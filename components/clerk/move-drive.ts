import type { RunGroup } from "@/lib/paddock/run-group-plan";

/**
 * The groups after one drive moves to another group (appended at its end). The same groups come
 * back unchanged when the drive is already there or either side is unknown, so a stray tap or a
 * drop outside a group saves nothing.
 */
export function moveDrive(groups: RunGroup[], driveId: string, toGroupIndex: number): RunGroup[] {
  const from = groups.findIndex((group) => group.driveIds.includes(driveId));
  if (from < 0 || from === toGroupIndex || !groups[toGroupIndex]) return groups;
  return groups.map((group, index) => {
    if (index === from)
      return { ...group, driveIds: group.driveIds.filter((id) => id !== driveId) };
    if (index === toGroupIndex) return { ...group, driveIds: [...group.driveIds, driveId] };
    return group;
  });
}
