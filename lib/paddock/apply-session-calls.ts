import type { LiveSession } from "./live-session";
import type { ScheduledSession } from "./scheduled-session";
import type { SessionCall } from "./session-call";

const minuteMs = 60_000;
const iso = (utcMs: number) => new Date(utcMs).toISOString();

/**
 * The day as it is going: each planned session with the clerk of course's marks applied and the
 * delay carried to every session behind it. Pure: `now` is a parameter.
 *
 * - A session's state is its latest mark (by time; marks at the same time in the order given,
 *   which is the order they were stored); its note is the latest note written on it.
 * - Start: the first "on-track" mark; a session never marked on track starts when it is expected
 *   (planned start plus the delay ahead), and a session "called" but not yet on track cannot start
 *   before its call or before `now`.
 * - Red flag: the time from a red flag to the next "on-track" (or to `now` while it is still
 *   red-flagged, or to the mark that ended it) is added to the session, so it still gets its
 *   minutes unless cut short.
 * - End: "finished" or "cut-short" ends it at that mark; a session on track or red-flagged cannot
 *   end before `now`; otherwise start + planned length + red-flag time.
 * - Delay: a session ending after its planned end pushes every later session back by the
 *   difference; gaps and the lunch break absorb none of it, and nothing ever moves earlier than
 *   planned (a session that ends early gives back earlier delay, not planned time).
 * - The clock alone never shifts the day: a session nobody marked follows the plan plus the delay
 *   ahead of it, so the board shows what the clerk marked, not a guess.
 * Marks for keys not in `sessions` are ignored.
 */
export function applySessionCalls({
  sessions,
  calls,
  now,
}: {
  sessions: readonly ScheduledSession[];
  calls: readonly SessionCall[];
  /** The current instant, UTC ISO string. */
  now: string;
}): LiveSession[] {
  const nowMs = Date.parse(now);
  if (Number.isNaN(nowMs)) throw new RangeError(`Not an instant: "${now}"`);

  const byKey = new Map<string, { call: SessionCall; atMs: number; order: number }[]>();
  calls.forEach((call, order) => {
    const list = byKey.get(call.sessionKey) ?? [];
    list.push({ call, atMs: Date.parse(call.at), order });
    byKey.set(call.sessionKey, list);
  });

  const ordered = [...sessions].sort(
    (a, b) =>
      Date.parse(a.startsAt) - Date.parse(b.startsAt) ||
      a.round - b.round ||
      a.groupIndex - b.groupIndex,
  );

  let delayMs = 0;
  return ordered.map((session): LiveSession => {
    const plannedStart = Date.parse(session.startsAt);
    const plannedEnd = Date.parse(session.endsAt);
    const lengthMs = plannedEnd - plannedStart;
    const marks = (byKey.get(session.key) ?? []).sort(
      (a, b) => a.atMs - b.atMs || a.order - b.order,
    );
    const latest = marks.at(-1);
    const state = latest?.call.state ?? "planned";
    const note = [...marks].reverse().find((m) => m.call.note !== null)?.call.note ?? null;

    let start = plannedStart + delayMs;
    const onTrack = marks.find((m) => m.call.state === "on-track");
    const firstRunMark = marks.find((m) => m.call.state !== "called");
    if (onTrack !== undefined) {
      start = onTrack.atMs;
    } else if (firstRunMark !== undefined) {
      // Marked red-flagged or ended without an "on-track" mark: it ran, from no later than that.
      start = Math.min(start, firstRunMark.atMs);
    } else if (state === "called" && latest !== undefined) {
      start = Math.max(start, latest.atMs, nowMs);
    }

    let stoppedMs = 0;
    let redSince: number | null = null;
    for (const m of marks) {
      if (m.call.state === "red-flag") {
        redSince ??= m.atMs;
      } else if (redSince !== null && m.call.state !== "called") {
        stoppedMs += Math.max(0, m.atMs - redSince);
        redSince = null;
      }
    }
    if (redSince !== null) stoppedMs += Math.max(0, nowMs - redSince);

    let end: number;
    if ((state === "finished" || state === "cut-short") && latest !== undefined) {
      end = latest.atMs;
    } else {
      end = start + lengthMs + stoppedMs;
      if (state === "on-track" || state === "red-flag") end = Math.max(end, nowMs);
    }

    delayMs = Math.max(0, end - plannedEnd);
    return {
      ...session,
      state,
      expectedStartsAt: iso(start),
      expectedEndsAt: iso(end),
      note,
      shiftedMinutes: Math.round((start - plannedStart) / minuteMs),
    };
  });
}
