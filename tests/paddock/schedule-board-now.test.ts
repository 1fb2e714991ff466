import { describe, expect, it } from "vitest";
import { applySessionCalls } from "@/lib/paddock/apply-session-calls";
import { boardNow } from "@/lib/paddock/board-now";
import type { ScheduledSession } from "@/lib/paddock/scheduled-session";
import type { SessionCall, SessionCallState } from "@/lib/paddock/session-call";

// An invented morning (demo data), as in schedule-session-calls.test.ts.
const at = (hhmm: string) => `2027-06-12T${hhmm}:00.000Z`;
const plan: ScheduledSession[] = [
  ["1-1", "09:00", "09:20"],
  ["1-2", "09:25", "09:45"],
  ["1-3", "09:50", "10:10"],
].map(([key = "", start = "", end = ""]) => ({
  key,
  round: 1,
  groupIndex: Number(key.slice(2)),
  startsAt: at(start),
  endsAt: at(end),
}));
const call = (sessionKey: string, state: SessionCallState, hhmm: string): SessionCall => ({
  sessionKey,
  state,
  at: at(hhmm),
  note: null,
});
const board = (calls: SessionCall[], hhmm: string) => {
  const now = at(hhmm);
  const b = boardNow({ live: applySessionCalls({ sessions: plan, calls, now }), now });
  return [b.onTrack?.key ?? null, b.next?.key ?? null, b.after?.key ?? null];
};

// Source: issue 10 item 7 (the board shows what is on track, the next group to call and the one
// after) and common practice (no source): the group at the dummy grid is the next one out.
describe("boardNow", () => {
  it("before the day: nothing on track, the first two groups next", () => {
    expect(board([], "08:00")).toEqual([null, "1-1", "1-2"]);
  });
  it("with no marks it follows the schedule: on track in a session's window, nothing in a gap", () => {
    expect(board([], "09:10")).toEqual(["1-1", "1-2", "1-3"]);
    expect(board([], "09:22")).toEqual([null, "1-2", "1-3"]);
    expect(board([], "09:50")).toEqual(["1-3", null, null]);
  });
  it("after the last session: nothing", () => {
    expect(board([], "10:30")).toEqual([null, null, null]);
  });
  it("follows the clerk's marks: a late group is still on track past its planned end", () => {
    const calls = [call("1-1", "on-track", "09:07")];
    expect(board(calls, "09:24")).toEqual(["1-1", "1-2", "1-3"]);
    expect(board([...calls, call("1-1", "finished", "09:27")], "09:28")).toEqual([
      null,
      "1-2",
      "1-3",
    ]);
  });
  it("a red-flagged session stays on the board as on track", () => {
    expect(
      board([call("1-2", "on-track", "09:25"), call("1-2", "red-flag", "09:30")], "09:40"),
    ).toEqual(["1-2", "1-3", null]);
  });
  it("a group called out of turn is the next one", () => {
    expect(
      board([call("1-1", "on-track", "09:00"), call("1-3", "called", "09:10")], "09:12"),
    ).toEqual(["1-1", "1-3", "1-2"]);
  });
});
