// An independent reading of the run-group rules, written from the issue and DOMAIN.md without the
// builder's code: the tests compare the builder with it. Slow on purpose (plain loops, no pruning).
import type { Drive } from "../../lib/paddock/drive";

const levels = ["novice", "intermediate", "advanced", "expert"];

// Source: common practice (no source) — one car cannot be on track twice at once (its two drivers
// never share a group), nor one driver in two cars.
export function conflict(a: Drive, b: Drive): boolean {
  return a.carKey === b.carKey || a.driverKey === b.driverKey;
}

/** Connected groups of drives linked by conflicts (indices into `drives`). */
export function conflictComponents(drives: Drive[]): number[][] {
  const parent = drives.map((_, i) => i);
  const find = (i: number): number => (parent[i] === i ? i : find(parent[i] ?? i));
  for (let i = 0; i < drives.length; i++)
    for (let j = i + 1; j < drives.length; j++)
      if (conflict(drives[i] as Drive, drives[j] as Drive)) parent[find(i)] = find(j);
  const byRoot = new Map<number, number[]>();
  for (let i = 0; i < drives.length; i++) byRoot.set(find(i), [...(byRoot.get(find(i)) ?? []), i]);
  return [...byRoot.values()];
}

/** Depth-first over labellings of the component's drives with 0…G−1 (dropping a partial labelling
 *  as soon as two conflicting drives sit less than two apart), looking for one that keeps
 *  conflicting drives different and not adjacent. */
export function spaceableAt(drives: Drive[], members: number[], groupCount: number): boolean {
  const k = members.length;
  // Room for every drive two groups from the last (0, 2, 4…): no need to look further.
  if (groupCount >= 2 * k - 1) return true;
  const label = new Array<number>(k).fill(-1);
  const place = (p: number): boolean => {
    if (p === k) return true;
    for (let g = 0; g < groupCount; g++) {
      let ok = true;
      for (let q = 0; q < p && ok; q++)
        if (
          conflict(drives[members[p] ?? 0] as Drive, drives[members[q] ?? 0] as Drive) &&
          Math.abs((label[q] ?? 0) - g) < 2
        )
          ok = false;
      if (!ok) continue;
      label[p] = g;
      if (place(p + 1)) return true;
    }
    label[p] = -1;
    return false;
  };
  return place(0);
}

/**
 * Hard-rule breaches of an assignment `groupOf[i]` ∈ 0…G−1 (rotation order; the wrap from the last
 * group to the next round's first is not adjacent, so 3 groups can keep a shared car's drivers
 * apart, as the issue asks).
 */
export function hardBreaches(
  drives: Drive[],
  cap: number,
  groupOf: number[],
  groupCount: number,
  spaceable: (i: number) => boolean,
): string[] {
  const out: string[] = [];
  const sizes = new Array<number>(groupCount).fill(0);
  for (const g of groupOf) sizes[g] = (sizes[g] ?? 0) + 1;
  // Source: DOMAIN.md §5 — a cap on cars on track.
  sizes.forEach((s, g) => {
    if (s > cap) out.push(`group ${g} has ${s} > ${cap}`);
  });
  for (let i = 0; i < drives.length; i++)
    for (let j = i + 1; j < drives.length; j++) {
      if (!conflict(drives[i] as Drive, drives[j] as Drive)) continue;
      const gap = Math.abs((groupOf[i] ?? 0) - (groupOf[j] ?? 0));
      // Source: DOMAIN.md §5 (HPDE run-group guidance) — two drivers sharing a car never share a group.
      if (gap === 0) out.push(`${drives[i]?.driveId} and ${drives[j]?.driveId} share a group`);
      // Source: DOMAIN.md §5 (HPDE run-group guidance; CP) — back-to-back sessions for one car or
      // driver avoided where the number of groups allows it.
      if (gap === 1 && spaceable(i))
        out.push(`${drives[i]?.driveId} and ${drives[j]?.driveId} back to back`);
    }
  return out;
}

/** The objective as documented on `planScoreWeights` (restated here, not imported). */
export function oracleScore(drives: Drive[], groupOf: number[], groupCount: number) {
  const groups: number[][] = Array.from({ length: groupCount }, () => []);
  groupOf.forEach((g, i) => {
    groups[g]?.push(i);
  });
  let backToBack = 0;
  let roundWrap = 0;
  for (let i = 0; i < drives.length; i++)
    for (let j = i + 1; j < drives.length; j++) {
      if (!conflict(drives[i] as Drive, drives[j] as Drive)) continue;
      const gap = Math.abs((groupOf[i] ?? 0) - (groupOf[j] ?? 0));
      if (gap === 1) backToBack++;
      // The last group and the first run back to back from one round into the next (from 4).
      if (groupCount >= 4 && gap === groupCount - 1) roundWrap++;
    }
  let classMix = 0;
  let classRankSpread = 0;
  let experienceSpread = 0;
  let lapSpreadMs = 0;
  for (const m of groups) {
    if (m.length === 0) continue;
    const ds = m.map((i) => drives[i] as Drive);
    classMix += new Set(ds.map((d) => d.classId)).size - 1;
    const ranks = ds.map((d) => d.classRank);
    classRankSpread += Math.max(...ranks) - Math.min(...ranks);
    const lv = ds.map((d) => levels.indexOf(d.experience));
    experienceSpread += Math.max(...lv) - Math.min(...lv);
    const laps = ds.flatMap((d) => (d.lapTimeMs ? [d.lapTimeMs] : []));
    if (laps.length > 1) lapSpreadMs += Math.max(...laps) - Math.min(...laps);
  }
  // The fastest estimate (ties: the lowest drive id); novices sharing its group count.
  const timed = drives
    .map((d, i) => ({ d, i }))
    .filter((x) => x.d.lapTimeMs)
    .sort(
      (a, b) => (a.d.lapTimeMs ?? 0) - (b.d.lapTimeMs ?? 0) || (a.d.driveId < b.d.driveId ? -1 : 1),
    );
  let noviceWithFastest = 0;
  const fastest = timed[0];
  if (fastest)
    for (const i of groups[groupOf[fastest.i] ?? 0] ?? [])
      if (i !== fastest.i && drives[i]?.experience === "novice") noviceWithFastest++;
  const sizes = groups.map((m) => m.length);
  const sizeSpread = Math.max(...sizes) - Math.min(...sizes);
  const total =
    1_000_000_000 * backToBack +
    100_000_000 * roundWrap +
    200_000 * noviceWithFastest +
    100_000 * classMix +
    30_000 * classRankSpread +
    20_000 * experienceSpread +
    10_000 * sizeSpread +
    lapSpreadMs;
  return {
    total,
    backToBack,
    roundWrap,
    noviceWithFastest,
    classMix,
    classRankSpread,
    experienceSpread,
    sizeSpread,
    lapSpreadMs,
  };
}

/** Every assignment of every group count from 1 up: the fewest groups with a valid assignment,
 *  and the best objective there. Hard rules and objective as in `hardBreaches` and `oracleScore`,
 *  with the conflict pairs worked out once (odometer enumeration; `oracleScore` only for the
 *  assignments that could beat the best so far on their hard rules alone). */
export function bruteForce(drives: Drive[], cap: number): { groups: number; total: number } {
  const n = drives.length;
  const comps = conflictComponents(drives);
  const pairs: [number, number][] = [];
  for (let i = 0; i < n; i++)
    for (let j = i + 1; j < n; j++)
      if (conflict(drives[i] as Drive, drives[j] as Drive)) pairs.push([i, j]);
  for (let groupCount = 1; groupCount <= 2 * n; groupCount++) {
    const spaceableOf = new Array<boolean>(n).fill(false);
    for (const m of comps) {
      const ok = spaceableAt(drives, m, groupCount);
      for (const i of m) spaceableOf[i] = ok;
    }
    let best = Number.POSITIVE_INFINITY;
    const groupOf = new Array<number>(n).fill(0);
    const sizes = new Array<number>(groupCount).fill(0);
    sizes[0] = n;
    for (;;) {
      let ok = sizes.every((s) => s <= cap);
      for (const [i, j] of pairs) {
        if (!ok) break;
        const gap = Math.abs((groupOf[i] ?? 0) - (groupOf[j] ?? 0));
        if (gap === 0 || (gap === 1 && spaceableOf[i])) ok = false;
      }
      if (ok) best = Math.min(best, oracleScore(drives, groupOf, groupCount).total);
      // Next assignment (odometer).
      let p = 0;
      while (p < n) {
        const g = groupOf[p] ?? 0;
        sizes[g] = (sizes[g] ?? 0) - 1;
        if (g + 1 < groupCount) {
          groupOf[p] = g + 1;
          sizes[g + 1] = (sizes[g + 1] ?? 0) + 1;
          break;
        }
        groupOf[p] = 0;
        sizes[0] = (sizes[0] ?? 0) + 1;
        p++;
      }
      if (p === n) break;
    }
    if (best < Number.POSITIVE_INFINITY) return { groups: groupCount, total: best };
  }
  throw new Error("no assignment at all");
}
