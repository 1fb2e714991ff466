// The builder against every assignment of small fields (the brute force in build-oracle.ts).
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { buildRunGroups } from "../../lib/paddock/build-run-groups";
import type { Drive } from "../../lib/paddock/drive";
import { smallField } from "./build-drives-arbitrary";
import {
  bruteForce,
  conflictComponents,
  hardBreaches,
  oracleScore,
  spaceableAt,
} from "./build-oracle";

function assignmentOf(drives: Drive[], groups: { driveIds: string[] }[]): number[] {
  const where = new Map<string, number>();
  groups.forEach((g, k) => {
    for (const id of g.driveIds) {
      expect(where.has(id), `${id} placed twice`).toBe(false);
      where.set(id, k);
    }
  });
  return drives.map((d) => {
    const g = where.get(d.driveId);
    expect(g, `${d.driveId} placed`).toBeDefined();
    return g ?? -1;
  });
}

function spaceableOf(drives: Drive[], groupCount: number): (i: number) => boolean {
  const flags = new Array<boolean>(drives.length).fill(false);
  for (const m of conflictComponents(drives)) {
    const ok = spaceableAt(drives, m, groupCount);
    for (const i of m) flags[i] = ok;
  }
  return (i) => flags[i] ?? false;
}

function checkAgainstBruteForce(drives: Drive[], cap: number) {
  const plan = buildRunGroups({ drives, capCars: cap });
  const groupOf = assignmentOf(drives, plan.groups);
  const groupCount = plan.groups.length;
  expect(hardBreaches(drives, cap, groupOf, groupCount, spaceableOf(drives, groupCount))).toEqual(
    [],
  );
  const own = oracleScore(drives, groupOf, groupCount);
  expect(plan.score.total).toBe(own.total);
  const best = bruteForce(drives, cap);
  expect(groupCount).toBe(best.groups);
  expect(plan.score.total).toBe(best.total);
  for (const d of drives) expect(plan.explanations[d.driveId]).toMatch(/^Car \d+ /);
}

describe("buildRunGroups on small fields, against every assignment", () => {
  it("finds the fewest groups and the best objective for up to 7 drives", () => {
    fc.assert(
      fc.property(smallField(1, 7), fc.integer({ min: 2, max: 4 }), (drives, cap) => {
        checkAgainstBruteForce(drives, cap);
      }),
      { seed: 1010, numRuns: 250 },
    );
  });

  it("finds the fewest groups and the best objective with one car per group (up to 5 drives)", () => {
    fc.assert(
      fc.property(smallField(1, 5), (drives) => {
        checkAgainstBruteForce(drives, 1);
      }),
      { seed: 1515, numRuns: 60 },
    );
  });

  it("finds the fewest groups and the best objective for 8 to 10 drives", () => {
    fc.assert(
      fc.property(smallField(8, 10, 8), fc.integer({ min: 4, max: 6 }), (drives, cap) => {
        // Keep the enumeration to about a million assignments per group count. The filter reads
        // the input only (never the builder's answer), so a builder that used too many groups
        // fails below instead of being skipped.
        fc.pre(Math.max(2, Math.ceil(drives.length / cap)) ** drives.length <= 1_100_000);
        checkAgainstBruteForce(drives, cap);
      }),
      { seed: 2020, numRuns: 20 },
    );
  });

  it("finds the optimum for a shared car, a driver with two cars and a novice", () => {
    const base = {
      entryId: "x",
      driverName: "",
      classId: "a",
      className: "Class A",
      classRank: 0,
      experience: "intermediate" as const,
    };
    const drives: Drive[] = [
      { ...base, driveId: "a:1", carNumber: 1, carKey: "c1", driverKey: "p1", lapTimeMs: 90_000 },
      { ...base, driveId: "a:2", carNumber: 1, carKey: "c1", driverKey: "p2", lapTimeMs: 92_000 },
      { ...base, driveId: "b:1", carNumber: 2, carKey: "c2", driverKey: "p1", lapTimeMs: 95_000 },
      {
        ...base,
        driveId: "c:1",
        carNumber: 3,
        carKey: "c3",
        driverKey: "p3",
        lapTimeMs: 91_000,
        experience: "novice",
      },
      {
        ...base,
        driveId: "d:1",
        carNumber: 4,
        carKey: "c4",
        driverKey: "p4",
        lapTimeMs: null,
        classId: "b",
        className: "Class B",
        classRank: 1,
      },
      { ...base, driveId: "e:1", carNumber: 5, carKey: "c5", driverKey: "p5", lapTimeMs: 99_000 },
    ];
    checkAgainstBruteForce(drives, 2);
  });
});
