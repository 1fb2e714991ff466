import type { LiveSession } from "./live-session";

export type BoardNow = {
  /** The session on track (or stopped under a red flag) now, or null between sessions. */
  onTrack: LiveSession | null;
  /** The next session to call, and the one after it; null when the day has no more. */
  next: LiveSession | null;
  after: LiveSession | null;
};

const inProgress = (s: LiveSession) => s.state === "on-track" || s.state === "red-flag";

/**
 * What the paddock board shows at an instant: on track now, the next group to call, the one after.
 * A session the clerk marked on track (or red-flagged) is on track. When none is marked, a session
 * nobody has marked yet counts as on track while its expected window holds `now` (the board then
 * follows the schedule), and as run once its expected end has passed. A "called" session is
 * waiting to go out, so it is next, not on track. Pure: `now` is a parameter.
 * @param live the output of applySessionCalls
 * @param now the current instant, UTC ISO string
 */
export function boardNow({ live, now }: { live: readonly LiveSession[]; now: string }): BoardNow {
  const nowMs = Date.parse(now);
  if (Number.isNaN(nowMs)) throw new RangeError(`Not an instant: "${now}"`);
  const ordered = [...live].sort(
    (a, b) =>
      Date.parse(a.expectedStartsAt) - Date.parse(b.expectedStartsAt) ||
      a.round - b.round ||
      a.groupIndex - b.groupIndex,
  );
  const over = (s: LiveSession) =>
    s.state === "finished" ||
    s.state === "cut-short" ||
    (s.state === "planned" && Date.parse(s.expectedEndsAt) <= nowMs);

  const marked = ordered.filter(inProgress);
  const onTrack =
    marked.at(-1) ??
    ordered.find(
      (s) =>
        s.state === "planned" &&
        Date.parse(s.expectedStartsAt) <= nowMs &&
        nowMs < Date.parse(s.expectedEndsAt),
    ) ??
    null;
  const from = onTrack === null ? 0 : ordered.indexOf(onTrack) + 1;
  // A called session is next wherever it sits in the order (the clerk may call out of turn).
  const waiting = ordered.filter(
    (s, i) => !over(s) && !inProgress(s) && (i >= from || s.state === "called"),
  );
  waiting.sort((a, b) => Number(b.state === "called") - Number(a.state === "called"));
  return { onTrack, next: waiting[0] ?? null, after: waiting[1] ?? null };
}
