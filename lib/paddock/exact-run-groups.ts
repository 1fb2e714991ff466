import { hardPenalty } from "./group-search-state";
import type { RunGroupInstance } from "./run-group-instance";
import { isRoundWrap, planScoreWeights } from "./score-run-groups";

const w = { ...planScoreWeights };

/** Instances up to this many drives are searched exactly. */
export const exactDriveLimit = 10;
/** Up to this many drives, when the heuristic finds no valid assignment for a number of groups,
 *  the exact search looks (within its budget) before the builder adds a group. */
export const exactFeasibilityLimit = 30;
/** Search nodes one exact search may visit before it settles for the best found. */
const nodeBudget = 3_000_000;

/**
 * Branch and bound over every assignment of drives to `groupCount` ordered groups, keeping the cap
 * and every hard rule at each step, pruning a partial assignment whose objective can no longer beat
 * the best found (every part of the objective only grows as drives are added; the size part is
 * bounded from the sizes so far). Starts from `incumbent` (e.g. the heuristic's answer).
 * `proven` is false when the node budget ran out (the answer is then the best found); `groupOf` is
 * null when no assignment keeps the hard rules (proven, or none found within the budget).
 */
export function exactRunGroups(
  instance: RunGroupInstance,
  groupCount: number,
  cap: number,
  spaceable: readonly boolean[],
  incumbent: { groupOf: Int32Array; objective: number } | null,
): { groupOf: Int32Array | null; objective: number; proven: boolean } {
  const n = instance.drives.length;
  const { classOf, experienceOf, lapOf, neighbours, componentOf, fastest } = instance;
  // Fastest drive first (so the novice part is known once it is placed), then most conflicts.
  const order = [...Array(n).keys()].sort(
    (x, y) =>
      (y === fastest ? 1 : 0) - (x === fastest ? 1 : 0) ||
      (neighbours[y]?.length ?? 0) - (neighbours[x]?.length ?? 0) ||
      x - y,
  );
  const groupOf = new Int32Array(n).fill(-1);
  const members: number[][] = Array.from({ length: groupCount }, () => []);
  let best = incumbent && incumbent.objective < hardPenalty ? incumbent.objective : Infinity;
  let bestGroups = incumbent && best < Infinity ? Int32Array.from(incumbent.groupOf) : null;
  let nodes = 0;
  let outOfNodes = false;
  const floorSize = Math.floor(n / groupCount);
  const ceilSize = Math.ceil(n / groupCount);

  const bound = (placed: number): number => {
    let total = 0;
    let smallest = Number.POSITIVE_INFINITY;
    let largest = 0;
    for (const m of members) {
      smallest = Math.min(smallest, m.length);
      largest = Math.max(largest, m.length);
      if (m.length === 0) continue;
      const classes = new Set<number>();
      let lo = 4;
      let hi = -1;
      let fast = Number.POSITIVE_INFINITY;
      let slow = 0;
      let rankLo = Number.POSITIVE_INFINITY;
      let rankHi = Number.NEGATIVE_INFINITY;
      for (const i of m) {
        classes.add(classOf[i] ?? 0);
        const rank = instance.drives[i]?.classRank ?? 0;
        rankLo = Math.min(rankLo, rank);
        rankHi = Math.max(rankHi, rank);
        lo = Math.min(lo, experienceOf[i] ?? 0);
        hi = Math.max(hi, experienceOf[i] ?? 0);
        const lap = lapOf[i] ?? -1;
        if (lap > 0) {
          fast = Math.min(fast, lap);
          slow = Math.max(slow, lap);
        }
      }
      total +=
        w.classMix * (classes.size - 1) +
        w.classRankSpread * (rankHi - rankLo) +
        w.experienceSpread * (hi - lo);
      if (slow > fast) total += w.lapSpreadMs * (slow - fast);
    }
    for (const i of order.slice(0, placed))
      for (const e of neighbours[i] ?? []) {
        if (e.other <= i || (groupOf[e.other] ?? -1) < 0) continue;
        const gap = Math.abs((groupOf[i] ?? 0) - (groupOf[e.other] ?? 0));
        if (gap === 1) total += w.backToBack;
        if (isRoundWrap(gap, groupCount)) total += w.roundWrap;
      }
    if (fastest >= 0 && (groupOf[fastest] ?? -1) >= 0)
      for (const i of members[groupOf[fastest] ?? 0] ?? [])
        if (i !== fastest && experienceOf[i] === 0) total += w.noviceWithFastest;
    const remaining = n - placed;
    const sizeLow = Math.max(largest, ceilSize) - Math.min(floorSize, smallest + remaining);
    return total + w.sizeSpread * Math.max(0, sizeLow);
  };

  const allowed = (i: number, g: number): boolean => {
    for (const e of neighbours[i] ?? []) {
      const other = groupOf[e.other] ?? -1;
      if (other < 0) continue;
      const gap = Math.abs(other - g);
      if (gap === 0 || (gap === 1 && spaceable[componentOf[i] ?? 0])) return false;
    }
    return true;
  };

  const visit = (pos: number) => {
    if (outOfNodes) return;
    if (pos === n) {
      const value = bound(n);
      if (value < best) {
        best = value;
        bestGroups = Int32Array.from(groupOf);
      }
      return;
    }
    const i = order[pos] ?? 0;
    // Reversing the rotation changes nothing in the objective: the first drive takes the first half.
    const top = pos === 0 ? Math.floor((groupCount - 1) / 2) : groupCount - 1;
    for (let g = 0; g <= top; g += 1) {
      if ((members[g]?.length ?? 0) >= cap || !allowed(i, g)) continue;
      nodes += 1;
      if (nodes > nodeBudget) {
        outOfNodes = true;
        return;
      }
      groupOf[i] = g;
      members[g]?.push(i);
      if (bound(pos + 1) < best) visit(pos + 1);
      members[g]?.pop();
      groupOf[i] = -1;
      if (outOfNodes) return;
    }
  };
  visit(0);
  return { groupOf: bestGroups, objective: best, proven: !outOfNodes };
}
