import { describe, expect, it } from "vitest";
import { changedEntryIds, diffRunSheets } from "@/lib/paddock/diff-run-sheets";
import { runSheetSchema } from "@/lib/paddock/run-sheet-schema";
import { drive, drives, settings, sheet } from "./run-sheet-fixture";

// Source for what counts as a change: issue 10 items 4 and 6 (product requirement) — republishing
// shows who moved and which times changed; an entrant is e-mailed only when their group or session
// times change.
const v1 = sheet([
  ["Blue", ["e1:1", "e3:1"]],
  ["Green", ["e2:1", "e4:1"]],
  ["Amber", ["e1:2"]],
]);

describe("diffRunSheets", () => {
  it("v1 and v1 again: nothing moved, no time changed, nobody e-mailed", () => {
    const diff = diffRunSheets(v1, structuredClone(v1));
    expect(diff.moved).toEqual([]);
    expect(diff.timesChanged).toEqual([]);
    expect(diff.blocksChanged).toEqual([]);
    expect(changedEntryIds(diff)).toEqual([]);
  });

  it("the first publication: every drive is added and every entrant is e-mailed", () => {
    expect(runSheetSchema.parse(v1)).toEqual(v1);
    const diff = diffRunSheets(null, v1);
    expect(diff.moved.map((m) => [m.carNumber, m.driverName, m.fromGroup, m.toGroup])).toEqual([
      [7, "Ada Quill", null, "Blue"],
      [7, "Ben Quill", null, "Amber"],
      [12, "Cleo Marsh", null, "Green"],
      [21, "Dev Ostrander", null, "Blue"],
      [33, "Eli Fenwick", null, "Green"],
    ]);
    expect(diff.timesChanged).toHaveLength(9);
    expect(diff.timesChanged.every((t) => t.from === null && t.to !== null)).toBe(true);
    expect(changedEntryIds(diff)).toEqual(["e1", "e2", "e3", "e4"]);
  });

  it("a car moved between groups: that entry only", () => {
    const v2 = sheet([
      ["Blue", ["e1:1"]],
      ["Green", ["e2:1", "e4:1", "e3:1"]],
      ["Amber", ["e1:2"]],
    ]);
    const diff = diffRunSheets(v1, v2);
    expect(diff.moved).toEqual([
      {
        driveId: "e3:1",
        entryId: "e3",
        carNumber: 21,
        driverName: "Dev Ostrander",
        fromGroup: "Blue",
        toGroup: "Green",
      },
    ]);
    expect(diff.timesChanged).toEqual([]);
    expect(changedEntryIds(diff)).toEqual(["e3"]);
  });

  it("a car added and a car removed: from null and to null", () => {
    const e5 = drive("e5", 1, 44, "Fay Goodwin");
    const v2 = sheet(
      [
        ["Blue", ["e1:1", "e3:1"]],
        ["Green", ["e2:1", "e5:1"]],
        ["Amber", ["e1:2"]],
      ],
      { drives: [...drives.filter((d) => d.entryId !== "e4"), e5] },
    );
    const diff = diffRunSheets(v1, v2);
    expect(diff.moved.map((m) => [m.carNumber, m.fromGroup, m.toGroup])).toEqual([
      [33, "Green", null],
      [44, null, "Green"],
    ]);
    expect(changedEntryIds(diff)).toEqual(["e4", "e5"]);
  });

  it("two groups swapped in the rotation: their times changed, nobody moved, their entrants e-mailed", () => {
    const v2 = sheet([
      ["Blue", ["e1:1", "e3:1"]],
      ["Amber", ["e1:2"]],
      ["Green", ["e2:1", "e4:1"]],
    ]);
    const diff = diffRunSheets(v1, v2);
    expect(diff.moved).toEqual([]);
    // Sessions run every 30 minutes from 09:00 BST (08:00Z): Green was 2nd (08:30Z), Amber 3rd (09:00Z).
    expect(diff.timesChanged.slice(0, 2)).toEqual([
      {
        group: "Amber",
        round: 1,
        from: { startsAt: "2027-06-12T09:00:00.000Z", endsAt: "2027-06-12T09:20:00.000Z" },
        to: { startsAt: "2027-06-12T08:30:00.000Z", endsAt: "2027-06-12T08:50:00.000Z" },
        entryIds: ["e1"],
      },
      {
        group: "Green",
        round: 1,
        from: { startsAt: "2027-06-12T08:30:00.000Z", endsAt: "2027-06-12T08:50:00.000Z" },
        to: { startsAt: "2027-06-12T09:00:00.000Z", endsAt: "2027-06-12T09:20:00.000Z" },
        entryIds: ["e2", "e4"],
      },
    ]);
    expect(diff.timesChanged.map((t) => `${t.group} ${t.round}`).sort()).toEqual(
      ["Amber 1", "Amber 2", "Amber 3", "Green 1", "Green 2", "Green 3"].sort(),
    );
    expect(changedEntryIds(diff)).toEqual(["e1", "e2", "e4"]);
  });

  it("a round dropped: its sessions go to null", () => {
    const v2 = sheet(
      [
        ["Blue", ["e1:1", "e3:1"]],
        ["Green", ["e2:1", "e4:1"]],
        ["Amber", ["e1:2"]],
      ],
      { settings: { ...settings, rounds: 2 } },
    );
    const diff = diffRunSheets(v1, v2);
    expect(diff.timesChanged.map((t) => [t.group, t.round, t.to])).toEqual([
      ["Blue", 3, null],
      ["Green", 3, null],
      ["Amber", 3, null],
    ]);
    expect(changedEntryIds(diff)).toEqual(["e1", "e2", "e3", "e4"]);
  });

  it("only the briefing moved: everyone is told (it is in their calendar file)", () => {
    const v2 = sheet(
      [
        ["Blue", ["e1:1", "e3:1"]],
        ["Green", ["e2:1", "e4:1"]],
        ["Amber", ["e1:2"]],
      ],
      { settings: { ...settings, briefing: { start: "08:00", minutes: 30 } } },
    );
    const diff = diffRunSheets(v1, v2);
    expect(diff.timesChanged).toEqual([]);
    expect(diff.blocksChanged).toEqual([
      {
        kind: "briefing",
        from: { startsAt: "2027-06-12T07:15:00.000Z", endsAt: "2027-06-12T07:45:00.000Z" },
        to: { startsAt: "2027-06-12T07:00:00.000Z", endsAt: "2027-06-12T07:30:00.000Z" },
      },
    ]);
    expect(changedEntryIds(diff)).toEqual(["e1", "e2", "e3", "e4"]);
  });
});
