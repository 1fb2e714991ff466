import { localIsoDateTime } from "./local-iso-date-time";
import type { ScheduleSettings } from "./schedule-settings";
import type { DayBlock, ScheduledSession } from "./scheduled-session";
import { zonedWallTime } from "./zoned-wall-time";

export type Schedule = {
  /** Every group's session in every round, in running order. */
  sessions: ScheduledSession[];
  /** The briefing and the lunch break, in time order. */
  blocks: DayBlock[];
  /** What the clerk of course should know, in plain words (an overrun, a time the clocks skip). */
  warnings: string[];
};

/** A fixed number of rounds is never more than this; "fit" stops here too (schedule settings). */
const maxRounds = 20;
const minuteMs = 60_000;

const iso = (utcMs: number) => new Date(utcMs).toISOString();

/**
 * Lays out the event day: the drivers' briefing, then the groups in rotation order, round after
 * round, each session `sessionMinutes` long with `gapMinutes` between sessions, the lunch break
 * kept clear (a session that would overlap it starts when it ends). `rounds: "fit"` runs as many
 * whole rounds as end by `dayEnd` (at most 20); a fixed number of rounds is always scheduled in
 * full, and a round that ends after `dayEnd` is named in a warning, never dropped.
 *
 * Wall-clock settings (day start and end, briefing, lunch) are read in the event's zone on the
 * event date, so a daylight-saving change that day moves them correctly; durations are real
 * elapsed minutes, so a session across the change is still `sessionMinutes` long. A wall time the
 * clocks skip or repeat is resolved as RFC 5545 §3.3.5 says (see zonedWallTime) and warned about.
 * Sessions run first after whichever ends later: the day's start or the briefing.
 * @param eventDate the venue's calendar date, "YYYY-MM-DD"
 * @param timeZone the venue's IANA zone
 * @param groupCount how many run groups rotate (0–60)
 */
export function buildSchedule({
  eventDate,
  timeZone,
  settings,
  groupCount,
}: {
  eventDate: string;
  timeZone: string;
  settings: ScheduleSettings;
  groupCount: number;
}): Schedule {
  if (!Number.isInteger(groupCount) || groupCount < 0 || groupCount > 60) {
    throw new RangeError(`groupCount must be a whole number from 0 to 60, got ${groupCount}`);
  }
  const warnings: string[] = [];
  const hhmm = (utcMs: number) => localIsoDateTime(utcMs, timeZone).slice(11, 16);

  const wall = (time: string, what: string): number => {
    const t = zonedWallTime({ date: eventDate, time, timeZone });
    if (t.fit === "gap") {
      warnings.push(
        `On ${eventDate} the clocks in ${timeZone} go forward over ${time}, so the ${what} is taken as ${hhmm(t.utcMs)}.`,
      );
    } else if (t.fit === "repeated") {
      warnings.push(
        `On ${eventDate} the clocks in ${timeZone} go back and ${time} happens twice; the ${what} is the first ${time} (${localIsoDateTime(t.utcMs, timeZone).slice(19)}).`,
      );
    }
    return t.utcMs;
  };

  const dayStart = wall(settings.dayStart, "day start");
  const dayEnd = wall(settings.dayEnd, "day end");
  const blocks: DayBlock[] = [];

  let briefing: { start: number; end: number } | null = null;
  if (settings.briefing !== null) {
    const start = wall(settings.briefing.start, "briefing");
    briefing = { start, end: start + settings.briefing.minutes * minuteMs };
    blocks.push({ kind: "briefing", startsAt: iso(briefing.start), endsAt: iso(briefing.end) });
  }
  const briefingEnd = briefing?.end ?? Number.NEGATIVE_INFINITY;
  let lunch: { start: number; end: number } | null = null;
  if (settings.lunch !== null) {
    const start = wall(settings.lunch.start, "lunch break");
    lunch = { start, end: start + settings.lunch.minutes * minuteMs };
    blocks.push({ kind: "lunch", startsAt: iso(lunch.start), endsAt: iso(lunch.end) });
    if (lunch.end <= dayStart || lunch.start >= dayEnd) {
      warnings.push(
        `The lunch break (${settings.lunch.start}) is outside the day (${settings.dayStart}–${settings.dayEnd}).`,
      );
    }
    if (briefing !== null && lunch.start < briefing.end && lunch.end > briefing.start) {
      warnings.push("The lunch break overlaps the drivers' briefing.");
    }
  }
  blocks.sort((a, b) => Date.parse(a.startsAt) - Date.parse(b.startsAt));

  if (dayEnd <= dayStart) {
    warnings.push(
      `The day ends (${settings.dayEnd}) before it starts (${settings.dayStart}), so no session is scheduled.`,
    );
    return { sessions: [], blocks, warnings };
  }
  if (briefingEnd > dayEnd) {
    warnings.push(
      `The drivers' briefing ends at ${hhmm(briefingEnd)}, after the day ends (${settings.dayEnd}).`,
    );
  }
  if (groupCount === 0) {
    warnings.push("There are no run groups yet, so no session is scheduled.");
    return { sessions: [], blocks, warnings };
  }

  const sessionMs = settings.sessionMinutes * minuteMs;
  const gapMs = settings.gapMinutes * minuteMs;
  /** One round from `cursor` (the earliest the next session may start); returns its sessions. */
  const layRound = (round: number, cursor: number) => {
    const laid: ScheduledSession[] = [];
    let next = cursor;
    for (let g = 1; g <= groupCount; g++) {
      let start = next;
      if (lunch !== null && start < lunch.end && start + sessionMs > lunch.start) start = lunch.end;
      const end = start + sessionMs;
      laid.push({
        key: `${round}-${g}`,
        round,
        groupIndex: g,
        startsAt: iso(start),
        endsAt: iso(end),
      });
      next = end + gapMs;
    }
    return { laid, next, roundEnd: next - gapMs };
  };

  const sessions: ScheduledSession[] = [];
  let cursor = Math.max(dayStart, briefingEnd);
  const fixed = settings.rounds === "fit" ? null : settings.rounds;
  let firstOver: { round: number; endsAt: number } | null = null;
  for (let round = 1; round <= (fixed ?? maxRounds); round++) {
    const { laid, next, roundEnd } = layRound(round, cursor);
    if (roundEnd > dayEnd) {
      if (fixed === null) break;
      firstOver ??= { round, endsAt: roundEnd };
    }
    sessions.push(...laid);
    cursor = next;
    if (fixed === null && round === maxRounds && layRound(round + 1, cursor).roundEnd <= dayEnd) {
      warnings.push(
        `More than ${maxRounds} rounds would fit; the schedule stops at ${maxRounds}, the most it takes.`,
      );
    }
  }

  if (fixed === null && sessions.length === 0) {
    warnings.push(
      `Not one whole round of ${groupCount} groups fits between ${settings.dayStart} and ${settings.dayEnd}; shorten the sessions or the gaps, or make the day longer.`,
    );
  }
  if (fixed !== null && firstOver !== null) {
    const over = Math.round((firstOver.endsAt - dayEnd) / minuteMs);
    const fit = firstOver.round - 1;
    const fitText = fit === 1 ? "only 1 whole round fits" : `only ${fit} whole rounds fit`;
    const rounds =
      firstOver.round === fixed
        ? `Round ${fixed} of ${fixed} runs`
        : `Rounds ${firstOver.round} to ${fixed} of ${fixed} run`;
    warnings.push(
      `${rounds} past the end of the day: round ${firstOver.round} ends at ${hhmm(firstOver.endsAt)}, ${over} minutes after ${settings.dayEnd}. ` +
        `They stay on the schedule; ${fitText}, so shorten the sessions or the gaps, or run fewer rounds.`,
    );
  }
  return { sessions, blocks, warnings };
}
