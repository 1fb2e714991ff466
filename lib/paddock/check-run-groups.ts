import { describeDrive, describePair } from "./describe-drive";
import type { Drive } from "./drive";
import { explainPlacements } from "./explain-placements";
import { formatLapTime } from "./format-lap-time";
import { canPlaceApart } from "./place-apart";
import { runGroupInstance } from "./run-group-instance";
import type { GaveWay, PlanScore, RunGroup } from "./run-group-plan";
import { scoreRunGroups } from "./score-run-groups";

/** A group whose estimates spread wider than this gets a soft finding (common practice (no source):
 *  cars within a few seconds of each other share a session comfortably). */
export const wideLapSpreadMs = 10_000;

export type RunGroupsCheck = {
  /** Hard rules: `blocks` when broken, `warns` when they gave way because this many groups cannot
   *  meet them (see `GaveWay`). */
  hard: GaveWay[];
  /** Preferences not met (all `warns`), and drives that run last in a round and first in the next. */
  soft: GaveWay[];
  score: PlanScore;
  explanations: Record<string, string>;
};

/**
 * Check any set of run groups against the drives ready to run and the cap: the builder's own result
 * before it is returned, the clerk's groups after every manual move (in the browser) and before
 * publishing (on the server). Groups are in rotation order (index 0 runs first); adjacent means
 * positions that differ by one. The wrap from the last group of a round to the first of the next
 * does not count as adjacent (it gets a soft `round-wrap` note instead): otherwise three groups
 * could never keep a shared car's drivers apart.
 *
 * Hard, `blocks`: a group over the cap; a drive in no group, in two groups or not among the drives;
 * two drives of one car or one driver in the same group; such drives in adjacent groups when their
 * conflicts could all be kept apart with this many groups (ignoring the cap).
 * Hard, `warns`: such drives in adjacent groups when no order of this many groups keeps them apart
 * (two groups; a driver with three cars and fewer than five groups…).
 * Soft: classes mixed, a novice with the fastest estimate, experience 2+ levels apart, estimates more
 * than 10 s apart, sizes more than one car apart, an empty group, a round wrap.
 */
export function checkRunGroups({
  drives,
  capCars,
  groups,
}: {
  drives: Drive[];
  capCars: number;
  groups: RunGroup[];
}): RunGroupsCheck {
  const instance = runGroupInstance(drives);
  const hard: GaveWay[] = [];
  const soft: GaveWay[] = [];
  const members: number[][] = groups.map(() => []);
  const where = new Map<number, number[]>();
  groups.forEach((group, g) => {
    for (const id of group.driveIds) {
      const i = instance.indexOf.get(id);
      if (i === undefined) {
        hard.push({
          rule: "placement",
          driveIds: [id],
          text: `${group.name} lists drive ${id}, which is not among the cars ready to run.`,
          severity: "blocks",
        });
        continue;
      }
      const seen = where.get(i) ?? [];
      if (seen.length === 0) members[g]?.push(i);
      where.set(i, [...seen, g]);
    }
  });
  const placedTwice = new Set<number>();
  instance.drives.forEach((d, i) => {
    const at = where.get(i) ?? [];
    if (at.length === 0)
      hard.push({
        rule: "placement",
        driveIds: [d.driveId],
        text: `${describeDrive(d)} is in no group.`,
        severity: "blocks",
      });
    else if (at.length > 1) {
      placedTwice.add(i);
      hard.push({
        rule: "placement",
        driveIds: [d.driveId],
        text: `${describeDrive(d)} is listed in ${at.map((g) => groups[g]?.name).join(" and ")}.`,
        severity: "blocks",
      });
    }
  });
  const names = groups.map((group) => group.name);
  groups.forEach((group, g) => {
    const size = members[g]?.length ?? 0;
    if (size > capCars)
      hard.push({
        rule: "cap",
        driveIds: (members[g] ?? []).map((i) => instance.drives[i]?.driveId ?? ""),
        text: `${group.name} has ${size} cars; no more than ${capCars} may be on track together.`,
        severity: "blocks",
      });
    if (size === 0)
      soft.push({
        rule: "sizes",
        driveIds: [],
        text: `${group.name} has no cars.`,
        severity: "warns",
      });
  });
  const groupCount = groups.length;
  const spaceable = instance.components.map(
    (m) => canPlaceApart(m, instance.neighbours, groupCount, 2) === true,
  );
  const groupOf = new Int32Array(instance.drives.length).fill(-1);
  members.forEach((m, g) => {
    for (const i of m) groupOf[i] = g;
  });
  instance.neighbours.forEach((edges, i) => {
    for (const e of edges) {
      const gi = groupOf[i] ?? -1;
      const gk = groupOf[e.other] ?? -1;
      if (e.other < i || gi < 0 || gk < 0) continue;
      const a = instance.drives[i];
      const b = instance.drives[e.other];
      if (!a || !b) continue;
      const pair = describePair(a, b, e);
      const ids = [a.driveId, b.driveId];
      const gap = Math.abs(gi - gk);
      if (gap === 0)
        hard.push({
          rule: "same-group",
          driveIds: ids,
          text: `${pair} are both in ${names[gi]}: a car or a driver can only be on track once at a time.`,
          severity: "blocks",
        });
      else if (gap === 1) {
        const can = spaceable[instance.componentOf[i] ?? 0];
        hard.push({
          rule: "back-to-back",
          driveIds: ids,
          text: `${pair} run in ${names[Math.min(gi, gk)]} and ${names[Math.max(gi, gk)]}, back to back: ${
            can
              ? `${groupCount} groups allow keeping them apart.`
              : `with ${groupCount} groups no order keeps them apart, so this rule gave way.`
          }`,
          severity: can ? "blocks" : "warns",
        });
      } else if (groupCount >= 3 && gap === groupCount - 1)
        soft.push({
          rule: "round-wrap",
          driveIds: ids,
          text: `${pair} run in the last and the first group: back to back from one round into the next unless a break falls between rounds.`,
          severity: "warns",
        });
    }
  });
  const score = scoreRunGroups(instance, members);
  const driveIdsOf = (m: number[]) => m.map((i) => instance.drives[i]?.driveId ?? "");
  members.forEach((m, g) => {
    const classes = [...new Set(m.map((i) => instance.drives[i]?.className ?? ""))];
    if (classes.length > 1)
      soft.push({
        rule: "classes",
        driveIds: driveIdsOf(m),
        text: `${names[g]} mixes ${classes.length} classes: ${classes.join(", ")}.`,
        severity: "warns",
      });
    const levels = m.map((i) => instance.drives[i]?.experience ?? "novice");
    const lv = m.map((i) => instance.experienceOf[i] ?? 0);
    if (lv.length && Math.max(...lv) - Math.min(...lv) >= 2)
      soft.push({
        rule: "experience",
        driveIds: driveIdsOf(m),
        text: `${names[g]} mixes experience levels ${[...new Set(levels)].join(", ")}.`,
        severity: "warns",
      });
    const laps = m.map((i) => instance.lapOf[i] ?? -1).filter((l) => l > 0);
    if (laps.length >= 2 && Math.max(...laps) - Math.min(...laps) > wideLapSpreadMs)
      soft.push({
        rule: "lap-spread",
        driveIds: driveIdsOf(m),
        text: `${names[g]}'s estimates run from ${formatLapTime(Math.min(...laps))} to ${formatLapTime(Math.max(...laps))}.`,
        severity: "warns",
      });
  });
  if (score.noviceWithFastest > 0 && instance.fastest >= 0) {
    const g = groupOf[instance.fastest] ?? 0;
    const novices = (members[g] ?? []).filter(
      (i) => i !== instance.fastest && instance.experienceOf[i] === 0,
    );
    soft.push({
      rule: "novice-with-fastest",
      driveIds: driveIdsOf(novices),
      text: `${novices.length} novice${novices.length === 1 ? "" : "s"} run in ${names[g]} with the fastest estimate of the day: ${novices.map((i) => `Car ${instance.drives[i]?.carNumber}`).join(", ")}.`,
      severity: "warns",
    });
  }
  if (score.sizeSpread > 1)
    soft.push({
      rule: "sizes",
      driveIds: [],
      text: `Group sizes run from ${Math.min(...members.map((m) => m.length))} to ${Math.max(...members.map((m) => m.length))} cars.`,
      severity: "warns",
    });
  const explanations = explainPlacements(instance, members, names, spaceable, placedTwice);
  return { hard, soft, score, explanations };
}
