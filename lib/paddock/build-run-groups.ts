import { checkRunGroups } from "./check-run-groups";
import type { Drive } from "./drive";
import { exactDriveLimit, exactRunGroups } from "./exact-run-groups";
import { improveRunGroups } from "./improve-run-groups";
import { orderGroupsByPace } from "./order-groups-by-pace";
import { canPlaceApart } from "./place-apart";
import { runGroupInstance } from "./run-group-instance";
import type { RunGroup, RunGroupPlan } from "./run-group-plan";
import { runGroupsLowerBound } from "./run-groups-lower-bound";
import { scoreRunGroups } from "./score-run-groups";

function membersOf(groupOf: Int32Array, groupCount: number): number[][] {
  const members: number[][] = Array.from({ length: groupCount }, () => []);
  groupOf.forEach((g, i) => {
    members[g]?.push(i);
  });
  return members;
}

/**
 * Build run groups from the drives ready to run (pure and deterministic: the same drives in any
 * order and the same cap give the same groups).
 *
 * Hard rules (see check-run-groups.ts): at most `capCars` per group; two drives of one car or one
 * driver never in one group, nor in adjacent groups of the rotation when this many groups can keep
 * them apart (the wrap from a round's last group to the next round's first is not adjacent).
 * Uses the fewest groups these allow: starting from the lower bound (cars ÷ cap rounded up, raised
 * where one car's or driver's drives need one group each), one more group only when the search finds
 * no assignment that keeps every hard rule. Within that number it minimises the weighted objective
 * of score-run-groups.ts. Up to `exactDriveLimit` drives the search is exact (branch and bound);
 * larger fields get the heuristic of improve-run-groups.ts. Groups then run fastest first where
 * that keeps the rules (order-groups-by-pace.ts).
 *
 * The result is checked, not trusted: `checkRunGroups` re-derives every rule from the groups alone,
 * and the builder throws rather than return groups its own check blocks.
 */
export function buildRunGroups({
  drives,
  capCars,
}: {
  drives: Drive[];
  capCars: number;
}): RunGroupPlan {
  if (!Number.isInteger(capCars) || capCars < 1)
    throw new Error(`The cap must be a whole number of cars, at least 1 (got ${capCars}).`);
  const instance = runGroupInstance(drives);
  const n = instance.drives.length;
  const lower = runGroupsLowerBound(instance, capCars);
  if (n === 0)
    return {
      groups: [],
      explanations: {},
      gaveWay: [],
      score: scoreRunGroups(instance, []),
      lowerBound: 0,
      groupCountReason: lower.reason,
    };
  let found: { groupCount: number; groupOf: Int32Array; spaceable: boolean[] } | null = null;
  let provenBelow = true;
  // 2n − 1 groups always work (drive k alone in group 2k), so the loop ends there at the latest.
  for (let groupCount = lower.groups; groupCount <= 2 * n - 1 && !found; groupCount += 1) {
    const spaceable = instance.components.map(
      (m) => canPlaceApart(m, instance.neighbours, groupCount, 2) === true,
    );
    const heuristic = improveRunGroups(instance, groupCount, capCars, spaceable);
    let best =
      heuristic.violations === 0
        ? { groupOf: heuristic.groupOf, objective: heuristic.objective }
        : null;
    if (n <= exactDriveLimit) {
      const exact = exactRunGroups(instance, groupCount, capCars, spaceable, best);
      if (exact && !exact.proven) provenBelow = false;
      best = exact;
    } else provenBelow = false;
    if (best) {
      const score = scoreRunGroups(instance, membersOf(best.groupOf, groupCount));
      if (score.total !== best.objective)
        throw new Error(`search and score disagree (${best.objective} vs ${score.total})`);
      found = { groupCount, groupOf: best.groupOf, spaceable };
    } else if (groupCount === 2 * n - 1)
      found = { groupCount, groupOf: Int32Array.from({ length: n }, (_, k) => 2 * k), spaceable };
  }
  if (!found) throw new Error("no run groups found");
  const { groupCount, spaceable } = found;
  const ordered = orderGroupsByPace(instance, found.groupOf, groupCount, spaceable);
  const groups: RunGroup[] = membersOf(ordered, groupCount).map((m, g) => ({
    name: `Group ${g + 1}`,
    driveIds: m
      .sort(
        (x, y) =>
          (instance.drives[x]?.carNumber ?? 0) - (instance.drives[y]?.carNumber ?? 0) || x - y,
      )
      .map((i) => instance.drives[i]?.driveId ?? ""),
  }));
  const check = checkRunGroups({ drives, capCars, groups });
  const blocking = check.hard.filter((h) => h.severity === "blocks");
  if (blocking.length > 0)
    throw new Error(
      `The builder's groups fail its own check: ${blocking.map((b) => b.text).join(" ")}`,
    );
  const extra = groupCount - lower.groups;
  const groupCountReason =
    extra === 0
      ? `${lower.reason} ${groupCount} group${groupCount === 1 ? "" : "s"} run.`
      : `${lower.reason} ${groupCount} groups run: with fewer, ${
          provenBelow ? "no arrangement exists" : "the search found no arrangement"
        } that keeps every car's and driver's drives in different, non-adjacent groups within the cap.`;
  return {
    groups,
    explanations: check.explanations,
    gaveWay: check.hard,
    score: check.score,
    lowerBound: lower.groups,
    groupCountReason,
  };
}
