import type { RunGroupInstance } from "./run-group-instance";

/**
 * Drive indices fastest first: highest class on the ladder first, then the quickest estimate
 * (drives without one after those with one in their class), then the most experienced, then id.
 */
export function paceSortedDrives(instance: RunGroupInstance): number[] {
  const { drives, lapOf, experienceOf } = instance;
  const lapKey = (i: number) => {
    const lap = lapOf[i] ?? -1;
    return lap > 0 ? lap : Number.POSITIVE_INFINITY;
  };
  return drives
    .map((_, i) => i)
    .sort(
      (x, y) =>
        (drives[y]?.classRank ?? 0) - (drives[x]?.classRank ?? 0) ||
        (lapKey(x) === lapKey(y) ? 0 : lapKey(x) < lapKey(y) ? -1 : 1) ||
        (experienceOf[y] ?? 0) - (experienceOf[x] ?? 0) ||
        x - y,
    );
}
