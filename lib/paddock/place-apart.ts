import type { ConflictEdge } from "./run-group-instance";

/** Search steps one question may take before answering "unknown" (components are a handful of
 *  drives in practice: a shared car, a driver with two cars). */
const stepBudget = 200_000;

/**
 * Can the drives of one conflict component sit in `groupCount` groups (ignoring the cap) so that
 * every two conflicting drives are at least `minGap` groups apart in the rotation (1: different
 * groups; 2: also not back to back)? Exact backtracking; `"unknown"` when the step budget runs out.
 */
export function canPlaceApart(
  members: readonly number[],
  neighbours: readonly ConflictEdge[][],
  groupCount: number,
  minGap: 1 | 2,
): boolean | "unknown" {
  const k = members.length;
  // Spread out one by one (0, minGap, 2·minGap…) always works when there is room.
  if (groupCount >= (k - 1) * minGap + 1) return true;
  if (groupCount < 1) return false;
  // Most-constrained first: by degree, then id.
  const order = [...members].sort(
    (x, y) => (neighbours[y]?.length ?? 0) - (neighbours[x]?.length ?? 0) || x - y,
  );
  const label = new Map<number, number>();
  let steps = 0;
  let outOfSteps = false;
  const place = (pos: number): boolean => {
    if (pos === order.length) return true;
    const v = order[pos] ?? 0;
    // Reversing the rotation keeps every gap, so the first drive may take the first half only.
    const top = pos === 0 ? Math.floor((groupCount - 1) / 2) : groupCount - 1;
    for (let g = 0; g <= top; g += 1) {
      steps += 1;
      if (steps > stepBudget) {
        outOfSteps = true;
        return false;
      }
      let ok = true;
      for (const e of neighbours[v] ?? []) {
        const other = label.get(e.other);
        if (other !== undefined && Math.abs(other - g) < minGap) {
          ok = false;
          break;
        }
      }
      if (!ok) continue;
      label.set(v, g);
      if (place(pos + 1)) return true;
      label.delete(v);
      if (outOfSteps) return false;
    }
    return false;
  };
  const found = place(0);
  return found ? true : outOfSteps ? "unknown" : false;
}

/**
 * The fewest groups that keep a component's conflicting drives in different groups (its chromatic
 * number), or a proven lower bound on it when the search runs out of steps.
 */
export function groupsNeededApart(
  members: readonly number[],
  neighbours: readonly ConflictEdge[][],
): number {
  for (let g = 1; g <= members.length; g += 1) {
    const answer = canPlaceApart(members, neighbours, g, 1);
    if (answer === true || answer === "unknown") return g;
  }
  return members.length;
}
