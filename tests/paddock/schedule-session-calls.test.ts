import { describe, expect, it } from "vitest";
import { applySessionCalls } from "@/lib/paddock/apply-session-calls";
import { liveSessionSchema } from "@/lib/paddock/live-session";
import type { ScheduledSession } from "@/lib/paddock/scheduled-session";
import type { SessionCall, SessionCallState } from "@/lib/paddock/session-call";

// An invented morning (demo data): three groups, 20-minute sessions, 5-minute gaps, from 09:00Z.
const at = (hhmm: string) => `2027-06-12T${hhmm}:00.000Z`;
const session = (
  round: number,
  groupIndex: number,
  start: string,
  end: string,
): ScheduledSession => ({
  key: `${round}-${groupIndex}`,
  round,
  groupIndex,
  startsAt: at(start),
  endsAt: at(end),
});
const plan: ScheduledSession[] = [
  session(1, 1, "09:00", "09:20"),
  session(1, 2, "09:25", "09:45"),
  session(1, 3, "09:50", "10:10"),
  session(2, 1, "10:15", "10:35"),
];
const call = (
  sessionKey: string,
  state: SessionCallState,
  hhmm: string,
  note: string | null = null,
): SessionCall => ({
  sessionKey,
  state,
  at: at(hhmm),
  note,
});
const times = (live: ReturnType<typeof applySessionCalls>) =>
  live.map(
    (s) =>
      `${s.key} ${s.state} ${s.expectedStartsAt.slice(11, 16)}-${s.expectedEndsAt.slice(11, 16)} ${s.shiftedMinutes}`,
  );

// Source for the shifting rules: issue 10 item 5 ("the schedule behind shifts") and
// common practice (no source): a group that goes out late, or loses time to a red flag, delays
// every group behind it; the lost time is not taken back from the groups that follow.

describe("applySessionCalls", () => {
  it("with no marks, the day is the plan, whatever the clock says", () => {
    const live = applySessionCalls({ sessions: plan, calls: [], now: at("11:00") });
    expect(times(live)).toEqual([
      "1-1 planned 09:00-09:20 0",
      "1-2 planned 09:25-09:45 0",
      "1-3 planned 09:50-10:10 0",
      "2-1 planned 10:15-10:35 0",
    ]);
    for (const s of live) expect(liveSessionSchema.parse(s)).toEqual(s);
  });

  it("a late start pushes every later session back by the delay (the gaps absorb none)", () => {
    const live = applySessionCalls({
      sessions: plan,
      calls: [call("1-1", "called", "09:05"), call("1-1", "on-track", "09:07")],
      now: at("09:10"),
    });
    expect(times(live)).toEqual([
      "1-1 on-track 09:07-09:27 7",
      "1-2 planned 09:32-09:52 7",
      "1-3 planned 09:57-10:17 7",
      "2-1 planned 10:22-10:42 7",
    ]);
  });

  it("a session called late cannot start before its call, nor before now while it waits", () => {
    const live = applySessionCalls({
      sessions: plan,
      calls: [call("1-1", "called", "08:55")],
      now: at("09:04"),
    });
    expect(times(live).slice(0, 2)).toEqual([
      "1-1 called 09:04-09:24 4",
      "1-2 planned 09:29-09:49 4",
    ]);
  });

  it("a red flag adds its stopped time to the session and to everything behind it", () => {
    const calls = [
      call("1-1", "on-track", "09:00"),
      call("1-1", "finished", "09:20"),
      call("1-2", "on-track", "09:25"),
      call("1-2", "red-flag", "09:33", "Car stopped at the hairpin"),
    ];
    // Still stopped at 09:40: 7 minutes lost so far; 1-2 ends at 09:25 + 20 + 7 = 09:52.
    const stopped = applySessionCalls({ sessions: plan, calls, now: at("09:40") });
    expect(times(stopped).slice(1)).toEqual([
      "1-2 red-flag 09:25-09:52 0",
      "1-3 planned 09:57-10:17 7",
      "2-1 planned 10:22-10:42 7",
    ]);
    expect(stopped[1]?.note).toBe("Car stopped at the hairpin");
    // Back on track at 09:45: 12 minutes lost; 1-2 ends at 09:57, everything behind 12 minutes late.
    const resumed = applySessionCalls({
      sessions: plan,
      calls: [...calls, call("1-2", "on-track", "09:45")],
      now: at("09:50"),
    });
    expect(times(resumed).slice(1)).toEqual([
      "1-2 on-track 09:25-09:57 0",
      "1-3 planned 10:02-10:22 12",
      "2-1 planned 10:27-10:47 12",
    ]);
    expect(resumed[1]?.note).toBe("Car stopped at the hairpin");
  });

  it("cut short ends the session at the mark, with its note; the delay behind shrinks but never goes below the plan", () => {
    const live = applySessionCalls({
      sessions: plan,
      calls: [
        call("1-1", "on-track", "09:10"),
        call("1-1", "finished", "09:30"),
        call("1-2", "on-track", "09:35"),
        call("1-2", "cut-short", "09:40", "Rain: track closed to dry"),
      ],
      now: at("09:41"),
    });
    expect(times(live)).toEqual([
      "1-1 finished 09:10-09:30 10",
      "1-2 cut-short 09:35-09:40 10",
      "1-3 planned 09:50-10:10 0",
      "2-1 planned 10:15-10:35 0",
    ]);
    expect(live[1]?.note).toBe("Rain: track closed to dry");
  });

  it("a session on track past its end runs until now, and pushes the rest", () => {
    const live = applySessionCalls({
      sessions: plan,
      calls: [call("1-1", "on-track", "09:00")],
      now: at("09:30"),
    });
    expect(times(live).slice(0, 2)).toEqual([
      "1-1 on-track 09:00-09:30 0",
      "1-2 planned 09:35-09:55 10",
    ]);
  });

  it("finishing early never moves a later session earlier than planned", () => {
    const live = applySessionCalls({
      sessions: plan,
      calls: [call("1-1", "on-track", "08:58"), call("1-1", "finished", "09:12")],
      now: at("09:13"),
    });
    expect(times(live).slice(0, 2)).toEqual([
      "1-1 finished 08:58-09:12 -2",
      "1-2 planned 09:25-09:45 0",
    ]);
  });

  it("takes the latest mark by time, whatever order the marks arrive in, and ignores unknown sessions", () => {
    const live = applySessionCalls({
      sessions: [...plan].reverse(),
      calls: [
        call("1-1", "finished", "09:20"),
        call("9-9", "on-track", "09:00"),
        call("1-1", "on-track", "09:00"),
      ],
      now: at("09:21"),
    });
    expect(live.map((s) => s.key)).toEqual(["1-1", "1-2", "1-3", "2-1"]);
    expect(live[0]?.state).toBe("finished");
  });
});
