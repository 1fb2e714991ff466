import { describe, expect, it } from "vitest";
import { callsOnSheet } from "@/lib/paddock/calls-on-sheet";
import { sheet } from "./run-sheet-fixture";

describe("marks follow their group across versions", () => {
  const call = (groupName: string, round: number, sessionKey: string) => ({
    sessionKey,
    groupName,
    round,
    state: "finished" as const,
    at: "2027-06-12T08:20:00.000Z",
    note: null,
  });
  // Invented sheets (tests/paddock/run-sheet-fixture.ts): Group 1 then Group 2, three rounds.
  const v1 = sheet([
    ["Group 1", ["e1:1", "e2:1", "e3:1"]],
    ["Group 2", ["e1:2", "e4:1"]],
  ]);
  const v2 = sheet([
    ["Group 2", ["e1:2", "e4:1"]],
    ["Group 1", ["e1:1", "e2:1", "e3:1"]],
  ]);

  it("keeps the key on the sheet it was made on", () => {
    expect(callsOnSheet([call("Group 1", 1, "1-1")], v1).map((c) => c.sessionKey)).toEqual(["1-1"]);
  });

  it("moves with its group when a later version reorders the rotation", () => {
    expect(callsOnSheet([call("Group 1", 1, "1-1")], v2).map((c) => c.sessionKey)).toEqual(["1-2"]);
  });

  it("drops a mark whose group or round is not on the sheet", () => {
    expect(callsOnSheet([call("Group 9", 1, "1-3"), call("Group 1", 7, "7-1")], v2)).toEqual([]);
  });
});
