import type { ScheduleSettings } from "../paddock/schedule-settings";

/**
 * The day before the clerk of course changes anything: briefing at 08:00, sessions of 20 minutes
 * from 08:45 with 5 minutes between, lunch 12:30–13:15, as many rounds as fit by 17:00. A typical
 * club track day's shape (common practice (no source)); every value is the clerk's to change.
 */
export const defaultScheduleSettings: ScheduleSettings = {
  dayStart: "08:45",
  dayEnd: "17:00",
  sessionMinutes: 20,
  gapMinutes: 5,
  lunch: { start: "12:30", minutes: 45 },
  rounds: "fit",
  briefing: { start: "08:00", minutes: 30 },
};
