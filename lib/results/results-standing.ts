import { formatWallClock } from "../paddock/format-wall-clock";
import { describeIssueTime } from "./describe-issue-time";

/**
 * Whether tech results are still provisional, in words with their time of issue. Provisional
 * results become final when the protest time after their issue has expired (Motorsport UK NCR 2026
 * Ch.3 App.6, as DOMAIN.md notes), and not while a re-inspection or protest is still open. Pure:
 * `now` is a parameter.
 * @param issuedAt the latest verdict's computing time (ISO), or null when none exists
 * @param protestWindowMinutes the event's protest time
 * @param openReinspections re-inspections (after an incident or a protest) not yet closed
 */
export function resultsStanding({
  issuedAt,
  timeZone,
  protestWindowMinutes,
  openReinspections,
  now,
}: {
  issuedAt: string | null;
  timeZone: string;
  protestWindowMinutes: number;
  openReinspections: number;
  now: Date;
}): { final: boolean; words: string } {
  const issued = `issued ${describeIssueTime(issuedAt, timeZone)}`;
  if (issuedAt === null) return { final: false, words: `Provisional — ${issued}` };
  if (openReinspections > 0) {
    const n =
      openReinspections === 1 ? "a re-inspection is" : `${openReinspections} re-inspections are`;
    return { final: false, words: `Provisional — ${issued}; ${n} still open` };
  }
  const ends = new Date(Date.parse(issuedAt) + protestWindowMinutes * 60_000);
  if (now.getTime() < ends.getTime()) {
    return {
      final: false,
      words: `Provisional — ${issued}; final at ${formatWallClock(ends.toISOString(), timeZone)} unless a protest is lodged (${protestWindowMinutes} minutes' protest time)`,
    };
  }
  return {
    final: true,
    words: `Final — ${issued}; the ${protestWindowMinutes} minutes' protest time ended at ${formatWallClock(ends.toISOString(), timeZone)}`,
  };
}
