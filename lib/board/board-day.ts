import { applySessionCalls } from "../paddock/apply-session-calls";
import { boardNow } from "../paddock/board-now";
import type { LiveSession } from "../paddock/live-session";
import type { SessionCall } from "../paddock/session-call";
import type { BoardGroup, BoardRunSheet } from "./board-schema";
import { formatBoardTime } from "./format-board-time";

/** A session with its group, as one panel of the board shows it. */
export type BoardSlot = { session: LiveSession; group: BoardGroup };

/** One line of "the day's shifts": what the clerk of course marked, or where a delay began. */
export type BoardShift = {
  key: string;
  kind: "red-flag" | "cut-short" | "late";
  groupName: string;
  round: number;
  words: string;
  note: string | null;
};

/** What the board shows at an instant. */
export type BoardDay = {
  live: LiveSession[];
  onTrack: BoardSlot | null;
  next: BoardSlot | null;
  after: BoardSlot | null;
  /** Red flags, sessions cut short, and the sessions where a new delay began, in the day's order. */
  shifts: BoardShift[];
  /** A briefing or lunch break under way when nothing is on track. */
  block: { kind: "briefing" | "lunch"; endsAt: string } | null;
};

/**
 * The day on the board at `now`: the published sessions with the clerk's marks applied (delays
 * carried to the sessions behind), what is on track, the next group to call and the one after,
 * and the shifts in words in the venue's time. Pure: `now` is a parameter.
 */
export function boardDay({
  runSheet,
  calls,
  timeZone,
  now,
}: {
  runSheet: BoardRunSheet;
  calls: readonly SessionCall[];
  timeZone: string;
  /** UTC ISO instant. */
  now: string;
}): BoardDay {
  const live = applySessionCalls({ sessions: runSheet.sessions, calls, now });
  const { onTrack, next, after } = boardNow({ live, now });
  const slot = (session: LiveSession | null): BoardSlot | null => {
    const group = session ? runSheet.groups[session.groupIndex - 1] : undefined;
    return session && group ? { session, group } : null;
  };
  const time = (iso: string) => formatBoardTime(iso, timeZone);
  const shifts: BoardShift[] = [];
  let shownDelay = 0;
  for (const s of live) {
    const groupName = runSheet.groups[s.groupIndex - 1]?.name ?? `Group ${s.groupIndex}`;
    const base = { groupName, round: s.round, note: s.note };
    if (s.state === "red-flag")
      shifts.push({
        ...base,
        key: `${s.key}-red`,
        kind: "red-flag",
        words: `Stopped under a red flag (on track from ${time(s.expectedStartsAt)})`,
      });
    else if (s.state === "cut-short")
      shifts.push({
        ...base,
        key: `${s.key}-cut`,
        kind: "cut-short",
        words: `Cut short at ${time(s.expectedEndsAt)} (planned to ${time(s.endsAt)})`,
      });
    // A delay is told once, where it begins or grows; the sessions behind carry it in their times.
    if (s.shiftedMinutes > shownDelay)
      shifts.push({
        ...base,
        key: `${s.key}-late`,
        kind: "late",
        note: s.state === "red-flag" || s.state === "cut-short" ? null : s.note,
        words: `${s.shiftedMinutes} min late: ${time(s.expectedStartsAt)} instead of ${time(s.startsAt)}`,
      });
    shownDelay = Math.max(0, s.shiftedMinutes);
  }
  const nowMs = Date.parse(now);
  const running = runSheet.blocks.find(
    (b) => Date.parse(b.startsAt) <= nowMs && nowMs < Date.parse(b.endsAt),
  );
  return {
    live,
    onTrack: slot(onTrack),
    next: slot(next),
    after: slot(after),
    shifts,
    block: onTrack === null && running ? { kind: running.kind, endsAt: running.endsAt } : null,
  };
}
