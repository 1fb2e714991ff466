// The builder on random fields of 40–300 drives (fast-check), checked by the independent rules of
// build-oracle.ts rather than by checkRunGroups alone.
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { buildRunGroups } from "../../lib/paddock/build-run-groups";
import { checkRunGroups } from "../../lib/paddock/check-run-groups";
import type { Drive } from "../../lib/paddock/drive";
import type { RunGroupPlan } from "../../lib/paddock/run-group-plan";
import { plantedField, randomField } from "./build-field";
import { conflictComponents, hardBreaches, spaceableAt } from "./build-oracle";

function independentlyValid(drives: Drive[], cap: number, plan: RunGroupPlan) {
  const where = new Map<string, number>();
  plan.groups.forEach((g, k) => {
    for (const id of g.driveIds) {
      expect(where.has(id), `${id} placed twice`).toBe(false);
      where.set(id, k);
    }
  });
  expect(where.size).toBe(drives.length);
  const groupOf = drives.map((d) => where.get(d.driveId) ?? -1);
  const spaceable = new Array<boolean>(drives.length).fill(false);
  for (const m of conflictComponents(drives)) {
    const ok = spaceableAt(drives, m, plan.groups.length);
    for (const i of m) spaceable[i] = ok;
  }
  expect(
    hardBreaches(drives, cap, groupOf, plan.groups.length, (i) => spaceable[i] ?? false),
  ).toEqual([]);
  // Every placement explained, naming the car and the group it runs in.
  drives.forEach((d, i) => {
    const text = plan.explanations[d.driveId] ?? "";
    expect(text.startsWith(`Car ${d.carNumber} `), text).toBe(true);
    expect(text).toContain(`runs in ${plan.groups[groupOf[i] ?? 0]?.name} `);
  });
  // The builder's own check agrees: nothing blocks, and it reports the same score.
  const check = checkRunGroups({ drives, capCars: cap, groups: plan.groups });
  expect(check.hard.filter((h) => h.severity === "blocks")).toEqual([]);
  expect(check.score).toEqual(plan.score);
}

const plantedSizes = fc.integer({ min: 3, max: 12 }).chain((groups) =>
  fc
    .integer({
      min: Math.max(4, Math.ceil(40 / groups)),
      max: Math.min(30, Math.floor(299 / (groups - 1))),
    })
    .chain((cap) =>
      fc.record({
        groups: fc.constant(groups),
        cap: fc.constant(cap),
        n: fc.integer({
          min: Math.max(40, (groups - 1) * cap + 1),
          max: Math.min(300, groups * cap),
        }),
        seed: fc.integer(),
        shareShare: fc.double({ min: 0, max: 0.3, noNaN: true }),
        twoCarShare: fc.double({ min: 0, max: 0.15, noNaN: true }),
      }),
    ),
);

describe("buildRunGroups on random fields of 40–300 drives", () => {
  it("uses the lower bound of groups when a valid assignment with that many exists, with no hard breach", () => {
    fc.assert(
      fc.property(plantedSizes, (p) => {
        const drives = plantedField(p);
        // Source: the test — groups = cars ÷ cap rounded up whenever the constraints allow.
        expect(Math.ceil(drives.length / p.cap)).toBe(p.groups);
        const plan = buildRunGroups({ drives, capCars: p.cap });
        expect(plan.lowerBound).toBe(p.groups);
        expect(plan.groups.length).toBe(p.groups);
        independentlyValid(drives, p.cap, plan);
      }),
      { seed: 3030, numRuns: 20 },
    );
  }, 30_000);

  it("never breaks a hard rule on unplanted fields and never goes below the lower bound", () => {
    fc.assert(
      fc.property(
        fc.record({
          n: fc.integer({ min: 40, max: 300 }),
          cap: fc.integer({ min: 4, max: 30 }),
          seed: fc.integer(),
          shareShare: fc.double({ min: 0, max: 0.5, noNaN: true }),
          twoCarShare: fc.double({ min: 0, max: 0.3, noNaN: true }),
        }),
        (p) => {
          const drives = randomField(p);
          const plan = buildRunGroups({ drives, capCars: p.cap });
          expect(plan.groups.length).toBeGreaterThanOrEqual(Math.ceil(drives.length / p.cap));
          expect(plan.groups.length).toBeGreaterThanOrEqual(plan.lowerBound);
          independentlyValid(drives, p.cap, plan);
        },
      ),
      { seed: 4040, numRuns: 15 },
    );
  }, 30_000);

  it("gives the same groups for the same drives in any order", () => {
    const drives = randomField({ n: 150, seed: 7, shareShare: 0.2, twoCarShare: 0.1 });
    const a = buildRunGroups({ drives, capCars: 20 });
    const b = buildRunGroups({ drives: [...drives].reverse(), capCars: 20 });
    expect(b).toEqual(a);
  });
});
