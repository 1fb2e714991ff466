import { describe, expect, it } from "vitest";
import { diffRunSheets } from "@/lib/paddock/diff-run-sheets";
import type { ClerkCar } from "@/lib/run-sheet/clerk-view";
import { describeEntryChanges } from "@/lib/run-sheet/describe-entry-changes";
import { entrySessions } from "@/lib/run-sheet/entry-sessions";
import { flagPublishedDrives } from "@/lib/run-sheet/flag-published-drives";
import { publishProblems } from "@/lib/run-sheet/publish-problems";
import { toDrives } from "@/lib/run-sheet/to-drives";
import { drives, sheet } from "../paddock/run-sheet-fixture";

const numbers = new Map([
  ["e1", 7],
  ["e2", 12],
  ["e3", 21],
  ["e4", 33],
  ["e5", 40],
]);

describe("only cars ready to run are published", () => {
  // Source: DOMAIN.md — the clerk of course may only publish run groups made of cleared cars;
  // a car needs to be signed on (waiver and fee) as well — common practice (no source).
  it("accepts a draft that places every ready drive once", () => {
    const groups = [
      { name: "Group 1", driveIds: ["e1:1", "e2:1", "e3:1"] },
      { name: "Group 2", driveIds: ["e1:2", "e4:1"] },
    ];
    expect(publishProblems({ drives, groups, carNumbers: numbers })).toEqual([]);
  });

  it("refuses a car that is not ready, names it, and names a ready car left out", () => {
    const groups = [
      { name: "Group 1", driveIds: ["e1:1", "e2:1", "e5:1"] },
      { name: "Group 2", driveIds: ["e1:2", "e4:1"] },
    ];
    const problems = publishProblems({ drives, groups, carNumbers: numbers });
    expect(problems.join(" ")).toContain("Group 1: car 40");
    expect(problems.join(" ")).toContain("car 21 (Dev Ostrander)");
  });

  it("refuses a drive placed twice", () => {
    const groups = [
      { name: "Group 1", driveIds: ["e1:1", "e2:1", "e3:1", "e4:1"] },
      { name: "Group 2", driveIds: ["e1:2", "e4:1"] },
    ];
    expect(publishProblems({ drives, groups, carNumbers: numbers })).toEqual([
      "car 33 (Eli Fenwick) is in two groups.",
    ]);
  });
});

describe("a shared car gives one drive per driver", () => {
  // Source: DOMAIN.md — a car may have two drivers, who never share a group.
  it("makes two drives with their own keys, experience and lap estimates", () => {
    const made = toDrives([
      {
        entryId: "e9",
        carNumber: 9,
        carId: "car-9",
        driverId: "u1",
        driverName: "Ada",
        driverExperience: "expert",
        lapTimeEstimateMs: 95_000,
        coDriverId: "u2",
        coDriverName: "Ben",
        coDriverExperience: null,
        coDriverLapTimeEstimateMs: null,
        classId: "sport",
        className: "Sport",
        classRank: 1,
      },
    ]);
    expect(made.map((d) => [d.driveId, d.carKey, d.driverKey, d.experience, d.lapTimeMs])).toEqual([
      ["e9:1", "car-9", "u1", "expert", 95_000],
      // A driver who did not say is run as a novice — common practice (no source).
      ["e9:2", "car-9", "u2", "novice", null],
    ]);
  });
});

describe("cars flagged after publication", () => {
  const car = (entryId: string, over: Partial<ClerkCar> = {}): ClerkCar => ({
    entryId,
    carNumber: numbers.get(entryId) ?? 0,
    car: "2004 Test Car",
    drivers: "A",
    declaredClassName: "Street",
    runsInClassName: "Street",
    status: "cleared",
    reason: null,
    signOn: { signedOn: true, missing: [] },
    withdrawn: false,
    reinspection: null,
    ready: true,
    ...over,
  });
  it("flags held, re-inspected and withdrawn cars, and leaves ready ones alone", () => {
    const published = sheet([
      ["Group 1", ["e1:1", "e2:1", "e3:1"]],
      ["Group 2", ["e1:2", "e4:1"]],
    ]);
    const flags = flagPublishedDrives(published, [
      car("e1"),
      car("e2", { status: "held", reason: "Harness expired" }),
      car("e3", {
        status: "waiting",
        reinspection: {
          id: "r",
          cause: "protest",
          askedBy: "Car 12",
          askedAt: "2027-06-12T10:00:00.000Z",
          reason: "Wing height",
        },
      }),
    ]);
    expect(flags.map((f) => [f.carNumber, f.why.split(":")[0]])).toEqual([
      [12, "Held at the tech line"],
      [21, "Sent back for re-inspection (protest)"],
      [33, "Withdrawn since the run sheet was published."],
    ]);
  });
});

describe("what the e-mail says changed", () => {
  it("names the move and the new times in the venue's clock", () => {
    const before = sheet([
      ["Group 1", ["e1:1", "e2:1", "e3:1"]],
      ["Group 2", ["e1:2", "e4:1"]],
    ]);
    const after = sheet([
      ["Group 1", ["e1:1", "e2:1"]],
      ["Group 2", ["e1:2", "e4:1", "e3:1"]],
    ]);
    const lines = describeEntryChanges(diffRunSheets(before, after), "e3", "Europe/London", [
      "Group 2",
    ]);
    expect(lines).toEqual(["Dev Ostrander moved from Group 1 to Group 2."]);
    expect(entrySessions(after, "e3").map((d) => d.groupName)).toEqual(["Group 2"]);
    expect(
      describeEntryChanges(diffRunSheets(before, after), "e2", "Europe/London", ["Group 1"]),
    ).toEqual([]);
  });

  it("says once per group that its times changed, never the times of a group it left", () => {
    const before = sheet([
      ["Group 1", ["e1:1", "e2:1", "e3:1"]],
      ["Group 2", ["e1:2", "e4:1"]],
    ]);
    // Swapped in the rotation, and car 21 (e3) moved to the group that now runs first.
    const after = sheet([
      ["Group 2", ["e1:2", "e4:1", "e3:1"]],
      ["Group 1", ["e1:1", "e2:1"]],
    ]);
    expect(
      describeEntryChanges(diffRunSheets(before, after), "e3", "Europe/London", ["Group 2"]),
    ).toEqual(["Dev Ostrander moved from Group 1 to Group 2.", "Group 2: session times changed."]);
  });
});
