import { describe, expect, it } from "vitest";
import { boardDay } from "../../lib/board/board-day";
import type { SessionCall } from "../../lib/paddock/session-call";
import { boardSheet } from "./board-fixtures";

// The fixture's sessions (UTC): 1-1 09:00–09:20 (Group A), 1-2 09:25–09:45 (B), 1-3 09:50–10:10
// (C), 2-1 10:15–10:35 (A), 2-2 10:40–11:00 (B), 2-3 11:05–11:25 (C).
// Source: IANA tz database (europe), Europe/London keeps BST, UTC+1, from the last Sunday in
// March to the last Sunday in October, so 09:00Z on 5 June 2027 is 10:00 at the venue.
const tz = "Europe/London";
const call = (
  sessionKey: string,
  state: SessionCall["state"],
  at: string,
  note: string | null = null,
) => ({ sessionKey, state, at: `2027-06-05T${at}:00.000Z`, note }) satisfies SessionCall;

const day = (now: string, calls: SessionCall[] = []) =>
  boardDay({
    runSheet: boardSheet().runSheet,
    calls,
    timeZone: tz,
    now: `2027-06-05T${now}:00.000Z`,
  });

const names = (d: ReturnType<typeof day>) =>
  [d.onTrack, d.next, d.after].map((s) => (s ? `${s.group.name} R${s.session.round}` : null));

describe("boardDay", () => {
  it("follows the published times when nobody has marked a session: on track, next, after", () => {
    expect(names(day("09:10"))).toEqual(["Group A R1", "Group B R1", "Group C R1"]);
    // Between sessions nothing is on track; the next group is still the one to call.
    expect(names(day("09:22"))).toEqual([null, "Group B R1", "Group C R1"]);
    // The rotation wraps into the next round.
    expect(names(day("09:55"))).toEqual(["Group C R1", "Group A R2", "Group B R2"]);
    // After the last session there is nothing left to call.
    expect(names(day("11:30"))).toEqual([null, null, null]);
    expect(day("09:10").shifts).toEqual([]);
  });

  it("brings the group's cars with the session, as published", () => {
    const d = day("09:10");
    expect(d.onTrack?.group.drives.map((x) => x.carNumber)).toEqual(
      boardSheet().runSheet.groups[0]?.drives.map((x) => x.carNumber),
    );
  });

  it("tells a red flag with its note and how long it stopped the track, then where the delay began", () => {
    const calls = [
      call("1-1", "on-track", "09:00"),
      call("1-1", "red-flag", "09:10", "Oil at the hairpin"),
      call("1-1", "on-track", "09:22"),
    ];
    const d = day("09:30", calls);
    // 12 min stopped: the session still gets its 20 min, so it ends 09:32 and B goes out late.
    expect(names(d)).toEqual(["Group A R1", "Group B R1", "Group C R1"]);
    expect(d.next?.session.shiftedMinutes).toBe(12);
    expect(d.shifts.map((s) => [s.kind, s.groupName, s.round, s.words, s.note])).toEqual([
      ["red-flag", "Group A", 1, "Red flag at 10:10, track stopped 12 min", "Oil at the hairpin"],
      ["late", "Group B", 1, "12 min late: 10:37 instead of 10:25", null],
    ]);
  });

  it("says the track is stopped now while the red flag stands", () => {
    const d = day("09:15", [call("1-1", "on-track", "09:00"), call("1-1", "red-flag", "09:10")]);
    expect(d.onTrack?.session.state).toBe("red-flag");
    expect(d.shifts[0]?.words).toBe("Red flag at 10:10, track stopped now");
  });

  it("tells a session cut short with the clerk's note, and moves nothing earlier than planned", () => {
    const calls = [
      call("1-1", "on-track", "09:00"),
      call("1-1", "cut-short", "09:12", "Recovery from the gravel"),
    ];
    const d = day("09:14", calls);
    expect(d.onTrack).toBeNull();
    expect(d.next?.group.name).toBe("Group B");
    expect(d.next?.session.expectedStartsAt).toBe("2027-06-05T09:25:00.000Z");
    expect(d.shifts.map((s) => [s.kind, s.words, s.note])).toEqual([
      ["cut-short", "Cut short at 10:12 (planned to 10:20)", "Recovery from the gravel"],
    ]);
  });

  it("shows a called group as next even before its planned time", () => {
    const d = day("09:21", [call("1-1", "finished", "09:20"), call("1-2", "called", "09:21")]);
    expect(d.next?.group.name).toBe("Group B");
    expect(d.next?.session.state).toBe("called");
  });

  it("names the lunch break or briefing when nothing is on track during one", () => {
    const { runSheet } = boardSheet();
    const withLunch = {
      ...runSheet,
      blocks: [
        {
          kind: "lunch" as const,
          startsAt: "2027-06-05T09:45:00Z",
          endsAt: "2027-06-05T09:50:00Z",
        },
      ],
    };
    const at = (now: string) =>
      boardDay({ runSheet: withLunch, calls: [], timeZone: tz, now: `2027-06-05T${now}:00.000Z` });
    expect(at("09:47").block).toEqual({ kind: "lunch", endsAt: "2027-06-05T09:50:00Z" });
    expect(at("09:30").block).toBeNull();
  });
});
