import type { RunGroupInstance } from "./run-group-instance";
import type { PlanScore } from "./run-group-plan";

/**
 * Weights of the builder's objective. `total` = Σ weight × part; lower is better, and the builder
 * only compares totals between assignments with the same (least) number of groups. All parts and
 * weights are integers, so totals are exact.
 *
 * - `backToBack` (1 000 000 000 per pair): a car's or a driver's two drives in adjacent groups of
 *   the rotation. Where the number of groups allows keeping them apart this is a hard rule
 *   (HPDE run-group guidance; common practice (no source)), so the term only counts pairs where it
 *   gave way; its weight puts "fewest such pairs" ahead of every preference below.
 * - `roundWrap` (100 000 000 per pair): with 4 or more groups, a car's or a driver's two drives in
 *   the last group and the first, which run back to back from one round into the next. Not a hard
 *   rule (with 3 groups it is the only way to keep a shared car's drivers apart within a round),
 *   but weighted above every preference, so the search keeps them apart across rounds too wherever
 *   it can.
 * - `noviceWithFastest` (200 000 per novice): novices in the group of the fastest lap-time estimate
 *   ("novices never with the fastest group where it can be avoided").
 * - `classMix` (100 000 per extra class): Σ over groups of (distinct classes − 1) — classes together.
 * - `classRankSpread` (30 000 per rung): Σ over groups of (highest − lowest `classRank`), so where
 *   classes must mix, neighbouring classes on the ladder mix rather than far-apart ones.
 * - `experienceSpread` (20 000 per level): Σ over groups of (highest − lowest experience level,
 *   novice 0 … expert 3) — experience levels together.
 * - `sizeSpread` (10 000 per car): largest − smallest group — sizes balanced.
 * - `lapSpreadMs` (1 per millisecond): Σ over groups of (slowest − fastest known estimate). A drive
 *   without an estimate adds nothing to any spread (it is neither fast nor slow); a group with
 *   fewer than two estimates has spread 0.
 *
 * In words: one extra class in a group costs as much as 100 s of lap-time spread, one rung of class-rank spread 30 s, one experience
 * step 20 s, one car of size imbalance 10 s.
 */
export const planScoreWeights = {
  backToBack: 1_000_000_000,
  roundWrap: 100_000_000,
  noviceWithFastest: 200_000,
  classMix: 100_000,
  classRankSpread: 30_000,
  experienceSpread: 20_000,
  sizeSpread: 10_000,
  lapSpreadMs: 1,
} as const;

/** Whether two groups `gap` apart in a rotation of `groupCount` are the last and the first, which
 *  run back to back from one round into the next (counted from 4 groups: see `roundWrap`). */
export function isRoundWrap(gap: number, groupCount: number): boolean {
  return groupCount >= 4 && gap === groupCount - 1;
}

/** Total of the weighted parts (see `planScoreWeights`). */
export function weightedTotal(parts: Omit<PlanScore, "groups" | "total">): number {
  const w = planScoreWeights;
  return (
    w.backToBack * parts.backToBack +
    w.roundWrap * parts.roundWrap +
    w.noviceWithFastest * parts.noviceWithFastest +
    w.classMix * parts.classMix +
    w.classRankSpread * parts.classRankSpread +
    w.experienceSpread * parts.experienceSpread +
    w.sizeSpread * parts.sizeSpread +
    w.lapSpreadMs * parts.lapSpreadMs
  );
}

/**
 * Score groups given as lists of drive indices (each drive at most once; drives in no group are
 * left out of every part).
 */
export function scoreRunGroups(
  instance: RunGroupInstance,
  members: readonly number[][],
): PlanScore {
  const groupOf = new Int32Array(instance.drives.length).fill(-1);
  members.forEach((m, g) => {
    for (const i of m) groupOf[i] = g;
  });
  let backToBack = 0;
  let roundWrap = 0;
  instance.neighbours.forEach((edges, i) => {
    for (const e of edges) {
      const gi = groupOf[i] ?? -1;
      const gk = groupOf[e.other] ?? -1;
      if (e.other <= i || gi < 0 || gk < 0) continue;
      if (Math.abs(gi - gk) === 1) backToBack += 1;
      if (isRoundWrap(Math.abs(gi - gk), members.length)) roundWrap += 1;
    }
  });
  let classMix = 0;
  let classRankSpread = 0;
  let experienceSpread = 0;
  let lapSpreadMs = 0;
  for (const m of members) {
    if (m.length === 0) continue;
    classMix += new Set(m.map((i) => instance.classOf[i])).size - 1;
    const ranks = m.map((i) => instance.drives[i]?.classRank ?? 0);
    classRankSpread += Math.max(...ranks) - Math.min(...ranks);
    const levels = m.map((i) => instance.experienceOf[i] ?? 0);
    experienceSpread += Math.max(...levels) - Math.min(...levels);
    const laps = m.map((i) => instance.lapOf[i] ?? -1).filter((l) => l > 0);
    if (laps.length >= 2) lapSpreadMs += Math.max(...laps) - Math.min(...laps);
  }
  let noviceWithFastest = 0;
  const fastestGroup = instance.fastest >= 0 ? (groupOf[instance.fastest] ?? -1) : -1;
  if (fastestGroup >= 0)
    for (const i of members[fastestGroup] ?? [])
      if (i !== instance.fastest && instance.experienceOf[i] === 0) noviceWithFastest += 1;
  const sizes = members.map((m) => m.length);
  const sizeSpread = sizes.length ? Math.max(...sizes) - Math.min(...sizes) : 0;
  const parts = {
    backToBack,
    roundWrap,
    noviceWithFastest,
    classMix,
    classRankSpread,
    experienceSpread,
    sizeSpread,
    lapSpreadMs,
  };
  return { groups: members.length, total: weightedTotal(parts), ...parts };
}
