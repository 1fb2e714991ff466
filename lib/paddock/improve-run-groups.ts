import { GroupSearchState } from "./group-search-state";
import { paceSortedDrives } from "./pace-sorted-drives";
import type { RunGroupInstance } from "./run-group-instance";
import { seededRandom } from "./seeded-random";

/** Upper bounds that keep one search short whatever the input. */
const maxPasses = 60;
const maxKicks = 40;

/**
 * The heuristic search for one number of groups: deal the pace-sorted drives into balanced groups
 * in order (fastest group first), then improve by the best single move or swap per drive until no
 * move helps; while a hard rule is still broken, swap a drive of a broken pair to a random group
 * far enough from its conflicts (seeded, so repeatable) and improve again. Keeps the best state.
 */
export function improveRunGroups(
  instance: RunGroupInstance,
  groupCount: number,
  cap: number,
  spaceable: readonly boolean[],
): { groupOf: Int32Array; objective: number; violations: number } {
  const n = instance.drives.length;
  const start = new Int32Array(n);
  const order = paceSortedDrives(instance);
  const base = Math.floor(n / groupCount);
  const extra = n % groupCount;
  let at = 0;
  for (let g = 0; g < groupCount; g += 1) {
    const size = base + (g < extra ? 1 : 0);
    for (let k = 0; k < size; k += 1) start[order[at++] ?? 0] = g;
  }
  const state = new GroupSearchState(instance, groupCount, cap, spaceable, start);
  descend(state);
  let best = { groupOf: Int32Array.from(state.groupOf), objective: state.objective() };
  const random = seededRandom(n * 7919 + groupCount * 104729 + cap);
  for (let kick = 0; kick < maxKicks; kick += 1) {
    const broken = state.violating();
    if (broken.length === 0) break;
    for (const i of broken) {
      const near = new Set(
        (instance.neighbours[i] ?? []).flatMap((e) => {
          const g = state.groupOf[e.other] ?? 0;
          return [g - 1, g, g + 1];
        }),
      );
      const targets = [...Array(groupCount).keys()].filter((g) => !near.has(g));
      if (targets.length === 0) continue;
      const to = targets[Math.floor(random() * targets.length)] ?? 0;
      const mates = [...Array(n).keys()].filter((j) => state.groupOf[j] === to);
      if ((state.size[to] ?? 0) < cap && random() < 0.5) state.move(i, to);
      else if (mates.length > 0) state.swap(i, mates[Math.floor(random() * mates.length)] ?? 0);
      else state.move(i, to);
    }
    descend(state);
    const objective = state.objective();
    if (objective < best.objective) best = { groupOf: Int32Array.from(state.groupOf), objective };
  }
  const final = new GroupSearchState(instance, groupCount, cap, spaceable, best.groupOf);
  return { ...best, violations: final.violating().length };
}

/** Best-improvement descent: for each drive the best move or swap, until a pass changes nothing. */
function descend(state: GroupSearchState) {
  const { n, groupCount, cap } = state;
  for (let pass = 0; pass < maxPasses; pass += 1) {
    let changed = false;
    for (let i = 0; i < n; i += 1) {
      const from = state.groupOf[i] ?? 0;
      let bestDelta = 0;
      let bestMove = -1;
      let bestSwap = -1;
      for (let g = 0; g < groupCount; g += 1) {
        if (g === from || (state.size[g] ?? 0) >= cap) continue;
        const d = state.moveDelta(i, g);
        if (d < bestDelta) {
          bestDelta = d;
          bestMove = g;
          bestSwap = -1;
        }
      }
      for (let j = 0; j < n; j += 1) {
        if (state.groupOf[j] === from) continue;
        const d = state.swapDelta(i, j);
        if (d < bestDelta) {
          bestDelta = d;
          bestSwap = j;
          bestMove = -1;
        }
      }
      if (bestMove >= 0) state.move(i, bestMove);
      else if (bestSwap >= 0) state.swap(i, bestSwap);
      else continue;
      changed = true;
    }
    if (!changed) return;
  }
}
