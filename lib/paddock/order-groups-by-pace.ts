import type { RunGroupInstance } from "./run-group-instance";
import { isRoundWrap } from "./score-run-groups";

function median(values: number[]): number {
  const s = [...values].sort((a, b) => a - b);
  const mid = s.length >> 1;
  return s.length % 2 ? (s[mid] ?? 0) : ((s[mid - 1] ?? 0) + (s[mid] ?? 0)) / 2;
}

/** Conflicting pairs back to back under an order: all of them, and those where it is a hard rule. */
function adjacentPairs(
  instance: RunGroupInstance,
  groupOf: Int32Array,
  position: Int32Array,
  spaceable: readonly boolean[],
) {
  let all = 0;
  let hard = 0;
  let wrap = 0;
  instance.neighbours.forEach((edges, i) => {
    for (const e of edges) {
      const gap = Math.abs(
        (position[groupOf[i] ?? 0] ?? 0) - (position[groupOf[e.other] ?? 0] ?? 0),
      );
      if (e.other <= i) continue;
      if (isRoundWrap(gap, position.length)) wrap += 1;
      if (gap !== 1) continue;
      all += 1;
      if (spaceable[instance.componentOf[i] ?? 0]) hard += 1;
    }
  });
  return { all, hard, wrap };
}

/**
 * Renumber the groups so the rotation runs fastest first: by the median of the group's lap-time
 * estimates, quickest first; groups without any estimate after those, highest average class rank
 * first; ties keep their order. Only done when the new order puts no more conflicting drives in the
 * adjacent groups (or in the last and first, from 4 groups) than the old one, in all and where
 * that is a hard rule (every other part of the objective ignores the order,
 * so the score does not change); otherwise the order the search found stays.
 */
export function orderGroupsByPace(
  instance: RunGroupInstance,
  groupOf: Int32Array,
  groupCount: number,
  spaceable: readonly boolean[],
): Int32Array {
  const keys = Array.from({ length: groupCount }, (_, g) => {
    const laps: number[] = [];
    let rankSum = 0;
    let count = 0;
    groupOf.forEach((h, i) => {
      if (h !== g) return;
      count += 1;
      rankSum += instance.drives[i]?.classRank ?? 0;
      const lap = instance.lapOf[i] ?? -1;
      if (lap > 0) laps.push(lap);
    });
    return {
      g,
      lap: laps.length ? median(laps) : Number.POSITIVE_INFINITY,
      rank: count ? rankSum / count : -1,
    };
  });
  const sorted = [...keys].sort(
    (x, y) => (x.lap === y.lap ? 0 : x.lap < y.lap ? -1 : 1) || y.rank - x.rank || x.g - y.g,
  );
  const position = new Int32Array(groupCount);
  sorted.forEach((k, at) => {
    position[k.g] = at;
  });
  const identity = Int32Array.from({ length: groupCount }, (_, g) => g);
  const now = adjacentPairs(instance, groupOf, identity, spaceable);
  const sortedPairs = adjacentPairs(instance, groupOf, position, spaceable);
  if (sortedPairs.hard > now.hard || sortedPairs.all > now.all || sortedPairs.wrap > now.wrap) {
    return Int32Array.from(groupOf);
  }
  return Int32Array.from(groupOf, (g) => position[g] ?? 0);
}
