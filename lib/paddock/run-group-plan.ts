import { z } from "zod";

/** One run group: its name as read out at the briefing and its drives, in the rotation's order. */
export const runGroupSchema = z.object({
  name: z.string().min(1).max(40),
  driveIds: z.array(z.string().min(1).max(80)).max(1000),
});
export type RunGroup = z.infer<typeof runGroupSchema>;

/** Groups in the order they run in each round of the rotation (index 0 runs first). */
export const runGroupsSchema = z.array(runGroupSchema).min(1).max(60);

/**
 * A rule that a set of run groups breaks, and for whom, in words.
 * - `blocks`: a hard rule the groups must not break (more cars than the cap, a car or a driver twice
 *   in one group, a car or driver in back-to-back groups where the number of groups allows keeping
 *   them apart, a car left out or placed twice). The server refuses to publish such groups.
 * - `warns`: a rule that gave way because no arrangement with this many groups can meet it (the
 *   builder accepts these too), or a soft preference that is not met (classes mixed, a novice with
 *   the fastest car…). Shown to the clerk; publishing is allowed.
 */
export type GaveWay = {
  /** Short rule name: `cap`, `same-group`, `back-to-back`, `round-wrap`, `placement`, `classes`,
   *  `novice-with-fastest`, `experience`, `lap-spread`, `sizes`. */
  rule: string;
  driveIds: string[];
  text: string;
  severity: "blocks" | "warns";
};

/**
 * The objective the builder minimises, part by part (lib/paddock/score-run-groups.ts documents each
 * term and `planScoreWeights` its weight). The builder first uses the fewest groups, then the lowest
 * `total`; `total` is the weighted sum of the other parts and does not include `groups`.
 */
export type PlanScore = {
  groups: number;
  total: number;
  /** Pairs of conflicting drives (one car, or one driver) in adjacent groups of the rotation. */
  backToBack: number;
  /** With 4 or more groups: conflicting pairs in the last group and the first, which run back to
   *  back from one round into the next. */
  roundWrap: number;
  /** Σ over groups of (distinct classes in the group − 1). */
  classMix: number;
  /** Σ over groups of (highest − lowest class rank on the ladder). */
  classRankSpread: number;
  /** Novice drives in the group of the fastest lap-time estimate (the fastest drive itself excluded). */
  noviceWithFastest: number;
  /** Σ over groups of (highest − lowest experience level), levels counted 0…3. */
  experienceSpread: number;
  /** Σ over groups of (slowest − fastest known lap-time estimate), in milliseconds. */
  lapSpreadMs: number;
  /** Largest group size − smallest group size. */
  sizeSpread: number;
};

/** What `buildRunGroups` returns: the groups, why each drive sits where it does, and what gave way. */
export type RunGroupPlan = {
  groups: RunGroup[];
  /** One plain-words line per drive, keyed by drive id. */
  explanations: Record<string, string>;
  /** Rules that could not be met with this number of groups, and for whom (all `warns`). */
  gaveWay: GaveWay[];
  score: PlanScore;
  /** The least number of groups any assignment could use (cars ÷ cap rounded up, raised where one
   *  car's or one driver's drives must sit in different groups). */
  lowerBound: number;
  /** Why this many groups, in words. */
  groupCountReason: string;
};
