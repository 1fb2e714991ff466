import { z } from "zod";

const clockTime = z.string().regex(/^([01]\d|2[0-3]):[0-5]\d$/, "Use 24-hour time, as 08:30.");

/**
 * How the clerk of course lays out the day, in the venue's local wall-clock time. The schedule is
 * computed from these by lib/paddock (sessions as UTC instants, correct across a DST change).
 */
export const scheduleSettingsSchema = z.object({
  dayStart: clockTime,
  dayEnd: clockTime,
  sessionMinutes: z.number().int().min(5).max(120),
  gapMinutes: z.number().int().min(0).max(60),
  lunch: z.object({ start: clockTime, minutes: z.number().int().min(10).max(120) }).nullable(),
  /** A number of rounds, or as many whole rounds as fit before the day ends. */
  rounds: z.union([z.number().int().min(1).max(20), z.literal("fit")]),
  /** The drivers' briefing before the first session (groups are confirmed there). */
  briefing: z.object({ start: clockTime, minutes: z.number().int().min(5).max(90) }).nullable(),
});
export type ScheduleSettings = z.infer<typeof scheduleSettingsSchema>;
