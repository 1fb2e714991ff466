import { z } from "zod";

const clockTime = z.string().regex(/^([01]\d|2[0-3]):[0-5]\d$/, "Use 24-hour time, as 08:30.");
const minutes = (min: number, max: number, what: string) =>
  z
    .number({ message: "Enter a whole number." })
    .int("Enter a whole number.")
    .min(min, `${what} at least ${min} minutes.`)
    .max(max, `${what} at most ${max} minutes.`);

/**
 * How the clerk of course lays out the day, in the venue's local wall-clock time. The schedule is
 * computed from these by lib/paddock (sessions as UTC instants, correct across a DST change).
 * Stored drafts and run sheets are read with this; what a clerk sends is checked with
 * {@link checkedScheduleSettingsSchema}, which also refuses a day that cannot happen.
 */
export const scheduleSettingsSchema = z.object({
  dayStart: clockTime,
  dayEnd: clockTime,
  sessionMinutes: minutes(5, 120, "A session lasts"),
  gapMinutes: minutes(0, 60, "The gap between sessions is"),
  lunch: z.object({ start: clockTime, minutes: minutes(10, 120, "Lunch lasts") }).nullable(),
  /** A number of rounds, or as many whole rounds as fit before the day ends. */
  rounds: z.union([
    z
      .number({ message: "Enter a number of rounds, or choose as many as fit." })
      .int("Enter a whole number of rounds.")
      .min(1, "At least one round.")
      .max(20, "At most 20 rounds."),
    z.literal("fit"),
  ]),
  /** The drivers' briefing before the first session (groups are confirmed there). */
  briefing: z
    .object({ start: clockTime, minutes: minutes(5, 90, "The briefing lasts") })
    .nullable(),
});
export type ScheduleSettings = z.infer<typeof scheduleSettingsSchema>;

const toMinutes = (time: string) => Number(time.slice(0, 2)) * 60 + Number(time.slice(3, 5));

/** The settings as a clerk sends them: also a day that ends after it starts, lunch and the
 *  briefing inside the day, in words a clerk can act on. */
export const checkedScheduleSettingsSchema = scheduleSettingsSchema.superRefine((s, ctx) => {
  const start = toMinutes(s.dayStart);
  const end = toMinutes(s.dayEnd);
  if (end <= start) {
    ctx.addIssue({
      code: "custom",
      path: ["dayEnd"],
      message: "The day must end after it starts.",
    });
    return;
  }
  if (s.lunch) {
    const from = toMinutes(s.lunch.start);
    if (from < start || from + s.lunch.minutes > end) {
      ctx.addIssue({
        code: "custom",
        path: ["lunch", "start"],
        message: `Lunch must fall inside the day (${s.dayStart}–${s.dayEnd}).`,
      });
    }
  }
  if (s.briefing && toMinutes(s.briefing.start) + s.briefing.minutes > end) {
    ctx.addIssue({
      code: "custom",
      path: ["briefing", "start"],
      message: `The briefing must end before the day does (${s.dayEnd}).`,
    });
  }
  if (s.sessionMinutes > end - start) {
    ctx.addIssue({
      code: "custom",
      path: ["sessionMinutes"],
      message: "A session cannot be longer than the day.",
    });
  }
});
