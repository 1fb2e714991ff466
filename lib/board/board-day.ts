import { applySessionCalls } from "../paddock/apply-session-calls";
import { boardNow } from "../paddock/board-now";
import { formatWallClock } from "../paddock/format-wall-clock";
import type { LiveSession } from "../paddock/live-session";
import type { SessionCall } from "../paddock/session-call";
import type { BoardGroup, BoardRunSheet } from "./board-schema";

/** A session with its group, as one panel of the board shows it. */
export type BoardSlot = { session: LiveSession; group: BoardGroup };

/** One line of "the day's changes": a red flag, a session cut short (each with the clerk's
 *  note), or the session where a delay began or grew. */
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
  const time = (iso: string) => formatWallClock(iso, timeZone);
  const shifts: BoardShift[] = [];
  let shownDelay = 0;
  for (const s of live) {
    const groupName = runSheet.groups[s.groupIndex - 1]?.name ?? `Group ${s.groupIndex}`;
    const base = { groupName, round: s.round };
    // Every red flag of the session, with how long it stopped the track and the clerk's note.
    const marks = calls.filter((c) => c.sessionKey === s.key);
    marks.forEach((mark, i) => {
      if (mark.state !== "red-flag" || marks[i - 1]?.state === "red-flag") return;
      const resumed = marks
        .slice(i + 1)
        .find((m) => m.state !== "red-flag" && m.state !== "called");
      const stoppedMin = resumed
        ? Math.round((Date.parse(resumed.at) - Date.parse(mark.at)) / 60_000)
        : null;
      shifts.push({
        ...base,
        key: `${s.key}-red-${i}`,
        kind: "red-flag",
        note: mark.note,
        words:
          stoppedMin === null
            ? `Red flag at ${time(mark.at)}, track stopped now`
            : `Red flag at ${time(mark.at)}, track stopped ${stoppedMin} min`,
      });
    });
    if (s.state === "cut-short")
      shifts.push({
        ...base,
        key: `${s.key}-cut`,
        kind: "cut-short",
        note: s.note,
        words: `Cut short at ${time(s.expectedEndsAt)} (planned to ${time(s.endsAt)})`,
      });
    // A delay is told once, where it begins or grows; the sessions behind carry it in their times.
    if (s.shiftedMinutes > shownDelay)
      shifts.push({
        ...base,
        key: `${s.key}-late`,
        kind: "late",
        note: null,
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
