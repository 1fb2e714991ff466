// checkRunGroups on hand-made groups, as the clerk's manual moves produce them.
import { describe, expect, it } from "vitest";
import { checkRunGroups } from "../../lib/paddock/check-run-groups";
import type { Drive } from "../../lib/paddock/drive";

const drive = (id: string, car: number, driver: string, over: Partial<Drive> = {}): Drive => ({
  driveId: id,
  entryId: id.split(":")[0] ?? id,
  carNumber: car,
  carKey: `car-${car}`,
  driverKey: driver,
  driverName: driver,
  classId: "cs",
  className: "Club Sport",
  classRank: 1,
  experience: "intermediate",
  lapTimeMs: 100_000,
  ...over,
});

const drives: Drive[] = [
  drive("s:1", 7, "Ana"),
  drive("s:2", 7, "Ben"),
  drive("a:1", 1, "Cy", { experience: "novice", lapTimeMs: 101_000 }),
  drive("b:1", 2, "Di", { lapTimeMs: 90_000, experience: "expert" }),
  drive("c:1", 3, "Ed", { classId: "st", className: "Street", classRank: 0, lapTimeMs: 115_000 }),
];
const g = (name: string, ...driveIds: string[]) => ({ name, driveIds });

describe("checkRunGroups", () => {
  it("blocks one car twice in a group and a group over the cap", () => {
    const check = checkRunGroups({
      drives,
      capCars: 2,
      groups: [g("Group 1", "s:1", "s:2", "a:1"), g("Group 2", "b:1"), g("Group 3", "c:1")],
    });
    const rules = check.hard.map((h) => `${h.rule}:${h.severity}`).sort();
    // Source: DOMAIN.md §5 — a cap on cars on track; two drivers sharing a car never share a group.
    expect(rules).toEqual(["cap:blocks", "same-group:blocks"]);
    expect(check.hard.find((h) => h.rule === "same-group")?.text).toContain(
      "Car 7's two drivers, Ana and Ben, are both in Group 1",
    );
  });

  it("blocks back to back when the number of groups could keep them apart, warns when it cannot", () => {
    const three = checkRunGroups({
      drives,
      capCars: 3,
      groups: [g("Group 1", "s:1", "a:1"), g("Group 2", "s:2", "b:1"), g("Group 3", "c:1")],
    });
    // Source: DOMAIN.md §5 (HPDE run-group guidance; CP) — back-to-back sessions for one car avoided.
    expect(three.hard).toMatchObject([{ rule: "back-to-back", severity: "blocks" }]);
    const two = checkRunGroups({
      drives,
      capCars: 3,
      groups: [g("Group 1", "s:1", "a:1", "c:1"), g("Group 2", "s:2", "b:1")],
    });
    expect(two.hard).toMatchObject([{ rule: "back-to-back", severity: "warns" }]);
    expect(two.score.backToBack).toBe(1);
  });

  it("notes a car in the last group and the next round's first, without scoring it", () => {
    const check = checkRunGroups({
      drives,
      capCars: 2,
      groups: [g("Group 1", "s:1", "a:1"), g("Group 2", "b:1", "c:1"), g("Group 3", "s:2")],
    });
    expect(check.hard).toEqual([]);
    expect(check.soft.filter((s) => s.rule === "round-wrap")).toHaveLength(1);
    expect(check.score.backToBack).toBe(0);
  });

  it("blocks a drive left out, listed twice, or not ready to run", () => {
    const check = checkRunGroups({
      drives,
      capCars: 5,
      groups: [g("Group 1", "s:1", "a:1", "a:1", "zz:1"), g("Group 2", "b:1"), g("Group 3", "s:2")],
    });
    const texts = check.hard.filter((h) => h.rule === "placement").map((h) => h.text);
    expect(texts).toHaveLength(3);
    expect(texts.join(" ")).toContain("zz:1, which is not among the cars ready to run");
    expect(texts.join(" ")).toContain("Car 3 (Ed, intermediate, 1:55.0 est.) is in no group.");
    expect(texts.join(" ")).toContain("is listed in Group 1 and Group 1");
    expect(check.explanations["c:1"]).toBe("Car 3 (Ed, intermediate, 1:55.0 est.) is in no group.");
  });

  it("scores and explains a valid set of groups, with its soft findings", () => {
    const check = checkRunGroups({
      drives,
      capCars: 3,
      groups: [g("Group 1", "s:1", "b:1", "a:1"), g("Group 2", "c:1"), g("Group 3", "s:2")],
    });
    expect(check.hard).toEqual([]);
    // Group 1: one class, levels novice…expert (3), estimates 1:30–1:41 (11 s); the fastest estimate
    // (Car 2) shares it with the novice in Car 1.
    expect(check.score).toMatchObject({
      groups: 3,
      classMix: 0,
      classRankSpread: 0,
      experienceSpread: 3,
      lapSpreadMs: 11_000,
      noviceWithFastest: 1,
      sizeSpread: 2,
      backToBack: 0,
    });
    expect(check.score.total).toBe(200_000 + 3 * 20_000 + 2 * 10_000 + 11_000);
    expect(check.soft.map((s) => s.rule).sort()).toEqual([
      "experience",
      "lap-spread",
      "novice-with-fastest",
      "round-wrap",
      "sizes",
    ]);
    expect(check.explanations["s:1"]).toBe(
      "Car 7 (Ana, intermediate, 1:40.0 est.) runs in Group 1 with the other 2 Club Sport cars (estimates in the group 1:30.0–1:41.0); kept apart from the same car's other driver (Ben) in Group 3.",
    );
    expect(check.explanations["a:1"]).toContain("a novice in the group of the fastest estimate");
  });
});
