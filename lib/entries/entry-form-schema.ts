import { z } from "zod";
import { normalizeEmail } from "../auth/normalize-email";
import { emailSchema } from "../auth/sign-in-schema";
import { idSchema } from "../http/id-schema";
import { experienceLevels } from "../paddock/drive";
import { parseLapTime } from "./parse-lap-time";

const lapTime = z
  .string()
  .trim()
  .min(1, "Give your lap-time estimate, e.g. 1:52.")
  .max(12, "Write it as minutes and seconds, e.g. 1:52.")
  .refine((v) => parseLapTime(v) !== null, "Write it as minutes and seconds, e.g. 1:52 or 1:52.4.")
  .transform((v) => parseLapTime(v) ?? 0);

const optionalEmail = z
  .string()
  .max(320, "Enter an e-mail address like name@example.com")
  .optional()
  .transform((value, ctx) => {
    if (!value || value.trim() === "") return undefined;
    const email = normalizeEmail(value);
    if (email === null) {
      ctx.addIssue({ code: "custom", message: "Enter an e-mail address like name@example.com" });
      return z.NEVER;
    }
    return email;
  });

/** The entry form, in the browser (react-hook-form) and in the server action alike. */
export const entryFormSchema = z.object({
  eventSlug: z.string().min(1).max(80),
  carId: z.uuid({ message: "Choose one of your cars." }),
  classId: z.string().min(1, "Choose a class.").max(40),
  lapTime,
  experience: z.enum(experienceLevels, { message: "Choose your experience." }),
  coDriverEmail: optionalEmail,
});

export type EntryFormInput = z.input<typeof entryFormSchema>;
export type EntryFormValues = z.output<typeof entryFormSchema>;

/** A co-driver's answer to an invitation: their own estimate and experience. */
export const acceptInviteSchema = z.object({
  token: z.string().min(20).max(100),
  lapTime,
  experience: z.enum(experienceLevels, { message: "Choose your experience." }),
});

/** The entrant asks someone (again) to co-drive. */
export const inviteCoDriverSchema = z.object({
  entryId: idSchema,
  coDriverEmail: emailSchema,
});
