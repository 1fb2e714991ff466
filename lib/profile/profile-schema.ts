import { z } from "zod";
import { experienceLevels } from "../paddock/drive";
import { ageOnDate } from "../scrutineer/calendar/age-on-date";
import { fullNameSchema, personNameSchema } from "./full-name-schema";
import { phoneDigits, phoneSchema } from "./phone-schema";

/** Older than this is taken for a typo in the year (a birth year off by a century). */
export const OLDEST_PLAUSIBLE_AGE = 100;

/** The latest calendar date anywhere on Earth now (UTC+14), so no one's today is "the future". */
export function latestTodayIso(now: Date = new Date()): string {
  return new Date(now.getTime() + 14 * 3600_000).toISOString().slice(0, 10);
}

function isCalendarDate(value: string): boolean {
  const m = /^(\d{4})-(\d{2})-(\d{2})$/.exec(value);
  if (!m) return false;
  const date = new Date(`${value}T00:00:00Z`);
  return !Number.isNaN(date.getTime()) && date.toISOString().slice(0, 10) === value;
}

const DATE_MESSAGE = "Enter your date of birth (day, month and year)";

const dateOfBirthSchema = z
  .string({ error: DATE_MESSAGE })
  .trim()
  .refine(isCalendarDate, DATE_MESSAGE)
  .refine(
    (v) => !isCalendarDate(v) || v <= latestTodayIso(),
    "A date of birth cannot be in the future",
  )
  .refine(
    (v) => !isCalendarDate(v) || ageOnDate(v, latestTodayIso()) <= OLDEST_PLAUSIBLE_AGE,
    `Check the year: that date makes you over ${OLDEST_PLAUSIBLE_AGE}`,
  );

const experienceMessage = "Choose your experience level";

/**
 * The entrant's profile as the form sends it (strings) and as it is stored. Used by the browser
 * (react-hook-form's resolver) and by the server action, so both give the same field messages.
 */
export const profileSchema = z
  .object({
    fullName: fullNameSchema,
    dateOfBirth: dateOfBirthSchema,
    phone: phoneSchema("your phone number"),
    emergencyContactName: personNameSchema("Enter the name of someone we can call if you are hurt"),
    emergencyContactPhone: phoneSchema("their phone number"),
    /** Competition licence grade and number as the licence shows them; empty when none. */
    licence: z
      .string()
      .trim()
      .max(80, "Keep the licence to 80 characters")
      .transform((v) => (v === "" ? null : v)),
    experienceLevel: z.enum(experienceLevels, { error: experienceMessage }),
  })
  .superRefine((p, ctx) => {
    if (
      phoneDigits(p.phone) !== "" &&
      phoneDigits(p.phone) === phoneDigits(p.emergencyContactPhone)
    ) {
      ctx.addIssue({
        code: "custom",
        path: ["emergencyContactPhone"],
        message: "Give someone else's number: this is your own",
      });
    }
  });

export type ProfileInput = z.input<typeof profileSchema>;
export type Profile = z.output<typeof profileSchema>;

/** Words for each experience level, as the form shows them. */
export const experienceLevelWords: Record<(typeof experienceLevels)[number], string> = {
  novice: "Novice — first season, or a few track days",
  intermediate: "Intermediate — several seasons of track days or sprints",
  advanced: "Advanced — regular competitor",
  expert: "Expert — instructor or national-level competitor",
};
