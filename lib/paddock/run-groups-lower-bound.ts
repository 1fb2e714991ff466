import { groupsNeededApart } from "./place-apart";
import type { RunGroupInstance } from "./run-group-instance";

/**
 * The fewest groups any assignment could use: the cars divided by the cap, rounded up, raised where
 * the drives of one car or one driver must all sit in different groups (the largest such set needs
 * one group each). With the reason in words.
 */
export function runGroupsLowerBound(
  instance: RunGroupInstance,
  capCars: number,
): { groups: number; reason: string } {
  const n = instance.drives.length;
  if (n === 0) return { groups: 0, reason: "No cars are ready to run." };
  const bySize = Math.ceil(n / capCars);
  let groups = bySize;
  let reason = `${n} drive${n === 1 ? "" : "s"} at no more than ${capCars} per group need at least ${bySize} group${bySize === 1 ? "" : "s"}`;
  let widest: number[] = [];
  let widestNeed = 0;
  for (const members of instance.components) {
    if (members.length < 2) continue;
    const need = groupsNeededApart(members, instance.neighbours);
    if (need > widestNeed) {
      widestNeed = need;
      widest = members;
    }
  }
  if (widestNeed > groups) {
    groups = widestNeed;
    const cars = widest.map((i) => {
      const d = instance.drives[i];
      return `Car ${d?.carNumber} (${d?.driverName || "driver not named"})`;
    });
    reason += `; raised to ${widestNeed} because ${cars.join(", ")} share a car or a driver and must each run in a different group`;
  }
  return { groups, reason: `${reason}.` };
}
