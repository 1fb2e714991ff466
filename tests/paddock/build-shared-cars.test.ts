// Shared cars and drivers with several cars: apart, and not back to back where the groups allow.
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { buildRunGroups } from "../../lib/paddock/build-run-groups";
import type { Drive } from "../../lib/paddock/drive";
import { randomField } from "./build-field";

function groupIndex(plan: { groups: { driveIds: string[] }[] }): Map<string, number> {
  const at = new Map<string, number>();
  plan.groups.forEach((g, k) => {
    for (const id of g.driveIds) at.set(id, k);
  });
  return at;
}

const base = {
  entryId: "x",
  classId: "a",
  className: "Club Sport",
  classRank: 0,
  experience: "intermediate" as const,
  lapTimeMs: 100_000,
};
const drive = (id: string, car: number, driver: string): Drive => ({
  ...base,
  driveId: id,
  carNumber: car,
  carKey: `car-${car}`,
  driverKey: driver,
  driverName: driver,
});

describe("shared cars", () => {
  it("keeps a shared car out of the last group and the first, which run back to back across rounds", () => {
    // 14 single cars and one shared car with a fast and a slow driver, 4 to a group: pace alone
    // would put its drivers in the first and the last group. Source: DOMAIN.md §5 (HPDE run-group
    // guidance) — back-to-back sessions for one car are avoided; the rotation runs round after
    // round, so the last group of a round is followed by the first (common practice (no source)).
    const drives: Drive[] = Array.from({ length: 14 }, (_, k) => ({
      ...drive(`e${k}:1`, k + 1, `p${k}`),
      entryId: `e${k}`,
      lapTimeMs: 90_000 + k * 1_000,
    }));
    drives.push({ ...drive("s:1", 99, "ps1"), entryId: "s", lapTimeMs: 89_000 });
    drives.push({ ...drive("s:2", 99, "ps2"), entryId: "s", lapTimeMs: 106_000 });
    const plan = buildRunGroups({ drives, capCars: 4 });
    const at = groupIndex(plan);
    expect(plan.groups).toHaveLength(4);
    const gap = Math.abs((at.get("s:1") ?? 0) - (at.get("s:2") ?? 0));
    expect(gap).toBe(2);
    expect(plan.score.roundWrap).toBe(0);
  });

  it("keeps a shared car's two drivers in different, non-adjacent groups when 3 or more groups run", () => {
    fc.assert(
      fc.property(
        fc.record({
          n: fc.integer({ min: 12, max: 200 }),
          cap: fc.integer({ min: 3, max: 25 }),
          seed: fc.integer(),
          shareShare: fc.double({ min: 0.05, max: 0.4, noNaN: true }),
          twoCarShare: fc.double({ min: 0, max: 0.2, noNaN: true }),
        }),
        (p) => {
          const drives = randomField(p);
          const plan = buildRunGroups({ drives, capCars: p.cap });
          const at = groupIndex(plan);
          const byCar = new Map<string, Drive[]>();
          for (const d of drives) byCar.set(d.carKey, [...(byCar.get(d.carKey) ?? []), d]);
          for (const pair of byCar.values()) {
            if (pair.length !== 2) continue;
            const gap = Math.abs(
              (at.get(pair[0]?.driveId ?? "") ?? 0) - (at.get(pair[1]?.driveId ?? "") ?? 0),
            );
            // Source: DOMAIN.md §5 (HPDE run-group guidance) — two drivers sharing a car never share
            // a group; back-to-back sessions for one car are avoided [CP].
            expect(gap).toBeGreaterThanOrEqual(plan.groups.length >= 3 ? 2 : 1);
          }
        },
      ),
      { seed: 5050, numRuns: 40 },
    );
  });

  it("with 3 groups puts a shared car in the first and the third", () => {
    const drives = [
      drive("s:1", 7, "Ana"),
      drive("s:2", 7, "Ben"),
      drive("a:1", 1, "Cy"),
      drive("b:1", 2, "Di"),
      drive("c:1", 3, "Ed"),
    ];
    const plan = buildRunGroups({ drives, capCars: 2 });
    expect(plan.groups).toHaveLength(3);
    const at = groupIndex(plan);
    expect(new Set([at.get("s:1"), at.get("s:2")])).toEqual(new Set([0, 2]));
    expect(plan.explanations["s:1"]).toContain(
      "kept apart from the same car's other driver (Ben) in Group",
    );
    expect(plan.gaveWay).toEqual([]);
  });

  it("with 2 groups splits a shared car and says that back to back gave way", () => {
    const drives = [drive("s:1", 7, "Ana"), drive("s:2", 7, "Ben"), drive("a:1", 1, "Cy")];
    const plan = buildRunGroups({ drives, capCars: 2 });
    expect(plan.groups).toHaveLength(2);
    const at = groupIndex(plan);
    expect(at.get("s:1")).not.toBe(at.get("s:2"));
    expect(plan.gaveWay).toHaveLength(1);
    expect(plan.gaveWay[0]).toMatchObject({ rule: "back-to-back", severity: "warns" });
    expect(plan.gaveWay[0]?.driveIds.sort()).toEqual(["s:1", "s:2"]);
    expect(plan.gaveWay[0]?.text).toContain("with 2 groups no order keeps them apart");
  });

  it("gives a driver with three cars three groups, and says for whom back to back gave way", () => {
    // Three drives of one driver need three groups; keeping them two apart would need five.
    const drives = [drive("a:1", 1, "Flo"), drive("b:1", 2, "Flo"), drive("c:1", 3, "Flo")];
    const plan = buildRunGroups({ drives, capCars: 10 });
    expect(plan.lowerBound).toBe(3);
    expect(plan.groups).toHaveLength(3);
    expect(plan.groupCountReason).toContain("raised to 3");
    // The fewest pairs back to back with 3 groups: 2 (groups 1–2 and 2–3).
    expect(plan.score.backToBack).toBe(2);
    expect(plan.gaveWay.map((g) => g.severity)).toEqual(["warns", "warns"]);
    expect(plan.gaveWay[0]?.text).toContain("Flo, in Car");
  });

  it("raises the groups when the cap leaves no room to keep shared cars apart", () => {
    // 6 shared cars (12 drives), cap 4: 3 groups would need all 12 in groups 1 and 3 (8 places).
    const drives = Array.from({ length: 6 }, (_, c) => [
      drive(`e${c}:1`, c + 1, `P${c}a`),
      drive(`e${c}:2`, c + 1, `P${c}b`),
    ]).flat();
    const plan = buildRunGroups({ drives, capCars: 4 });
    expect(plan.lowerBound).toBe(3);
    expect(plan.groups).toHaveLength(4);
    expect(plan.groupCountReason).toContain("no arrangement");
    expect(plan.gaveWay).toEqual([]);
  });
});
