import type { RunGroupInstance } from "./run-group-instance";
import { isRoundWrap, planScoreWeights } from "./score-run-groups";

// Read once: the search asks for these millions of times.
const w = { ...planScoreWeights };

/** What one broken hard rule costs in the search: more than any possible soft total. */
export const hardPenalty = 1e12;

function spreadAfter(sorted: readonly number[], remove: number, add: number): number {
  let count = sorted.length;
  let lo = Number.POSITIVE_INFINITY;
  let hi = Number.NEGATIVE_INFINITY;
  if (count > 0) {
    const first = sorted[0] ?? 0;
    const last = sorted[count - 1] ?? 0;
    lo = remove > 0 && first === remove ? (sorted[1] ?? Number.POSITIVE_INFINITY) : first;
    hi = remove > 0 && last === remove ? (sorted[count - 2] ?? Number.NEGATIVE_INFINITY) : last;
    if (remove > 0) count -= 1;
  }
  if (add > 0) {
    count += 1;
    lo = Math.min(lo, add);
    hi = Math.max(hi, add);
  }
  return count >= 2 ? hi - lo : 0;
}

function insertSorted(list: number[], value: number) {
  let lo = 0;
  let hi = list.length;
  while (lo < hi) {
    const mid = (lo + hi) >> 1;
    if ((list[mid] ?? 0) < value) lo = mid + 1;
    else hi = mid;
  }
  list.splice(lo, 0, value);
}

function removeSorted(list: number[], value: number) {
  const at = list.indexOf(value);
  if (at >= 0) list.splice(at, 1);
}

/**
 * An assignment of drives to `groupCount` groups with running totals, so the change in the
 * objective (hard penalties + the weighted total of score-run-groups.ts) of moving one drive or
 * swapping two is found without rescoring every group.
 */
export class GroupSearchState {
  readonly n: number;
  readonly groupOf: Int32Array;
  readonly size: Int32Array;
  private readonly classCount: Int32Array;
  private readonly distinct: Int32Array;
  private readonly levelCount: Int32Array;
  private readonly rankCount: Int32Array;
  private readonly laps: number[][];
  private readonly novices: Int32Array;
  private readonly term: Float64Array;
  /** The novice part as it stands (kept up to date by `move`). */
  private noviceNow = 0;

  constructor(
    readonly instance: RunGroupInstance,
    readonly groupCount: number,
    readonly cap: number,
    /** Per conflict component: does "not back to back" apply (can it be met with this many groups)? */
    readonly spaceable: readonly boolean[],
    start: Int32Array,
  ) {
    this.n = instance.drives.length;
    this.groupOf = Int32Array.from(start);
    this.size = new Int32Array(groupCount);
    this.classCount = new Int32Array(groupCount * instance.classCount);
    this.distinct = new Int32Array(groupCount);
    this.levelCount = new Int32Array(groupCount * 4);
    this.rankCount = new Int32Array(groupCount * instance.rankValues.length);
    this.laps = Array.from({ length: groupCount }, () => []);
    this.novices = new Int32Array(groupCount);
    this.term = new Float64Array(groupCount);
    for (let i = 0; i < this.n; i += 1) this.add(i, this.groupOf[i] ?? 0);
    for (let g = 0; g < groupCount; g += 1) this.term[g] = this.groupTerm(g, -1, -1);
    this.noviceNow = this.noviceTerm(-1, -1, -1, -1);
  }

  private add(i: number, g: number) {
    const inst = this.instance;
    const c = g * inst.classCount + (inst.classOf[i] ?? 0);
    if ((this.classCount[c] ?? 0) === 0) this.distinct[g] = (this.distinct[g] ?? 0) + 1;
    this.classCount[c] = (this.classCount[c] ?? 0) + 1;
    const level = inst.experienceOf[i] ?? 0;
    this.levelCount[g * 4 + level] = (this.levelCount[g * 4 + level] ?? 0) + 1;
    if (level === 0) this.novices[g] = (this.novices[g] ?? 0) + 1;
    const r = g * inst.rankValues.length + (inst.rankOf[i] ?? 0);
    this.rankCount[r] = (this.rankCount[r] ?? 0) + 1;
    const lap = inst.lapOf[i] ?? -1;
    if (lap > 0) insertSorted(this.laps[g] ?? [], lap);
    this.size[g] = (this.size[g] ?? 0) + 1;
    this.groupOf[i] = g;
  }

  private remove(i: number, g: number) {
    const inst = this.instance;
    const c = g * inst.classCount + (inst.classOf[i] ?? 0);
    this.classCount[c] = (this.classCount[c] ?? 0) - 1;
    if ((this.classCount[c] ?? 0) === 0) this.distinct[g] = (this.distinct[g] ?? 0) - 1;
    const level = inst.experienceOf[i] ?? 0;
    this.levelCount[g * 4 + level] = (this.levelCount[g * 4 + level] ?? 0) - 1;
    if (level === 0) this.novices[g] = (this.novices[g] ?? 0) - 1;
    const r = g * inst.rankValues.length + (inst.rankOf[i] ?? 0);
    this.rankCount[r] = (this.rankCount[r] ?? 0) - 1;
    const lap = inst.lapOf[i] ?? -1;
    if (lap > 0) removeSorted(this.laps[g] ?? [], lap);
    this.size[g] = (this.size[g] ?? 0) - 1;
  }

  /** Class, experience and lap-spread cost of group `g` after taking drive `out` out and putting
   *  drive `into` in (−1: none). */
  private groupTerm(g: number, out: number, into: number): number {
    const inst = this.instance;
    const size = (this.size[g] ?? 0) - (out >= 0 ? 1 : 0) + (into >= 0 ? 1 : 0);
    if (size <= 0) return 0;
    let distinct = this.distinct[g] ?? 0;
    const co = out >= 0 ? (inst.classOf[out] ?? 0) : -1;
    const ci = into >= 0 ? (inst.classOf[into] ?? 0) : -1;
    if (co !== ci) {
      if (co >= 0 && this.classCount[g * inst.classCount + co] === 1) distinct -= 1;
      if (ci >= 0 && this.classCount[g * inst.classCount + ci] === 0) distinct += 1;
    }
    let lo = 4;
    let hi = -1;
    const lvOut = out >= 0 ? (inst.experienceOf[out] ?? 0) : -1;
    const lvIn = into >= 0 ? (inst.experienceOf[into] ?? 0) : -1;
    for (let l = 0; l < 4; l += 1) {
      const count =
        (this.levelCount[g * 4 + l] ?? 0) - (l === lvOut ? 1 : 0) + (l === lvIn ? 1 : 0);
      if (count > 0) {
        lo = Math.min(lo, l);
        hi = Math.max(hi, l);
      }
    }
    const ranks = inst.rankValues.length;
    const rOut = out >= 0 ? (inst.rankOf[out] ?? 0) : -1;
    const rIn = into >= 0 ? (inst.rankOf[into] ?? 0) : -1;
    let rLo = -1;
    let rHi = -1;
    for (let r = 0; r < ranks; r += 1) {
      const count =
        (this.rankCount[g * ranks + r] ?? 0) - (r === rOut ? 1 : 0) + (r === rIn ? 1 : 0);
      if (count > 0) {
        if (rLo < 0) rLo = r;
        rHi = r;
      }
    }
    const rankSpread = (inst.rankValues[rHi] ?? 0) - (inst.rankValues[rLo] ?? 0);
    const lap = spreadAfter(
      this.laps[g] ?? [],
      out >= 0 ? (inst.lapOf[out] ?? -1) : -1,
      into >= 0 ? (inst.lapOf[into] ?? -1) : -1,
    );
    return (
      w.classMix * (distinct - 1) +
      w.classRankSpread * rankSpread +
      w.experienceSpread * (hi - lo) +
      w.lapSpreadMs * lap
    );
  }

  private pairCost(i: number, gap: number): number {
    if (gap === 0) return hardPenalty;
    if (gap === 1)
      return w.backToBack + (this.spaceable[this.instance.componentOf[i] ?? 0] ? hardPenalty : 0);
    return isRoundWrap(gap, this.groupCount) ? w.roundWrap : 0;
  }

  private conflictDelta(i: number, from: number, to: number, skip: number): number {
    let delta = 0;
    for (const e of this.instance.neighbours[i] ?? []) {
      if (e.other === skip) continue;
      const gk = this.groupOf[e.other] ?? 0;
      delta += this.pairCost(i, Math.abs(to - gk)) - this.pairCost(i, Math.abs(from - gk));
    }
    return delta;
  }

  /** Novice term after moving drive a (and b) to new groups (−1: none). */
  private noviceTerm(a: number, aTo: number, b: number, bTo: number): number {
    const f = this.instance.fastest;
    if (f < 0) return 0;
    const lv = this.instance.experienceOf;
    let fg = this.groupOf[f] ?? 0;
    if (a === f) fg = aTo;
    if (b === f) fg = bTo;
    let count = this.novices[fg] ?? 0;
    if (a >= 0 && lv[a] === 0) count += (aTo === fg ? 1 : 0) - (this.groupOf[a] === fg ? 1 : 0);
    if (b >= 0 && lv[b] === 0) count += (bTo === fg ? 1 : 0) - (this.groupOf[b] === fg ? 1 : 0);
    if (lv[f] === 0) count -= 1;
    return w.noviceWithFastest * count;
  }

  private sizeTerm(a: number, da: number, b: number, db: number): number {
    let lo = Number.POSITIVE_INFINITY;
    let hi = 0;
    for (let g = 0; g < this.groupCount; g += 1) {
      const s = (this.size[g] ?? 0) + (g === a ? da : 0) + (g === b ? db : 0);
      lo = Math.min(lo, s);
      hi = Math.max(hi, s);
    }
    return w.sizeSpread * (hi - lo);
  }

  /** Change in the objective if drive `i` moves to group `to` (caller checks the cap). */
  moveDelta(i: number, to: number): number {
    const from = this.groupOf[i] ?? 0;
    return (
      this.groupTerm(from, i, -1) -
      (this.term[from] ?? 0) +
      this.groupTerm(to, -1, i) -
      (this.term[to] ?? 0) +
      this.conflictDelta(i, from, to, -1) +
      this.noviceTerm(i, to, -1, -1) -
      this.noviceNow +
      this.sizeTerm(from, -1, to, 1) -
      this.sizeTerm(-1, 0, -1, 0)
    );
  }

  /** Change in the objective if drives `i` and `j` (in different groups) trade places. */
  swapDelta(i: number, j: number): number {
    const a = this.groupOf[i] ?? 0;
    const b = this.groupOf[j] ?? 0;
    return (
      this.groupTerm(a, i, j) -
      (this.term[a] ?? 0) +
      this.groupTerm(b, j, i) -
      (this.term[b] ?? 0) +
      this.conflictDelta(i, a, b, j) +
      this.conflictDelta(j, b, a, i) +
      this.noviceTerm(i, b, j, a) -
      this.noviceNow
    );
  }

  move(i: number, to: number) {
    const from = this.groupOf[i] ?? 0;
    this.remove(i, from);
    this.add(i, to);
    this.term[from] = this.groupTerm(from, -1, -1);
    this.term[to] = this.groupTerm(to, -1, -1);
    this.noviceNow = this.noviceTerm(-1, -1, -1, -1);
  }

  swap(i: number, j: number) {
    const a = this.groupOf[i] ?? 0;
    const b = this.groupOf[j] ?? 0;
    this.move(i, b);
    this.move(j, a);
  }

  /** The whole objective from scratch: hard penalties plus the weighted total. */
  objective(): number {
    let total = 0;
    for (let g = 0; g < this.groupCount; g += 1) total += this.term[g] ?? 0;
    for (let i = 0; i < this.n; i += 1)
      for (const e of this.instance.neighbours[i] ?? [])
        if (e.other > i)
          total += this.pairCost(
            i,
            Math.abs((this.groupOf[i] ?? 0) - (this.groupOf[e.other] ?? 0)),
          );
    return total + this.noviceTerm(-1, -1, -1, -1) + this.sizeTerm(-1, 0, -1, 0);
  }

  /** Drives in a pair that breaks a hard rule (same group, or back to back where that applies). */
  violating(): number[] {
    const out = new Set<number>();
    for (let i = 0; i < this.n; i += 1)
      for (const e of this.instance.neighbours[i] ?? []) {
        const gap = Math.abs((this.groupOf[i] ?? 0) - (this.groupOf[e.other] ?? 0));
        if (gap === 0 || (gap === 1 && this.spaceable[this.instance.componentOf[i] ?? 0]))
          out.add(i);
      }
    return [...out];
  }
}
