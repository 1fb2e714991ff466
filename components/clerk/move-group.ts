import type { RunGroup } from "@/lib/paddock/run-group-plan";

/**
 * The groups with one group swapped with its neighbour earlier (-1) or later (+1) in the rotation.
 * A group keeps its name (drivers were told "Group 2"); its session times follow its new place.
 */
export function moveGroup(groups: RunGroup[], index: number, step: -1 | 1): RunGroup[] {
  const target = index + step;
  const moving = groups[index];
  const other = groups[target];
  if (!moving || !other) return groups;
  const next = [...groups];
  next[index] = other;
  next[target] = moving;
  return next;
}
