import { z } from "zod";
import { emailSchema } from "../auth/sign-in-schema";
import { idSchema } from "../http/id-schema";

const fullName = (what: string) =>
  z
    .string({ error: `Type ${what}` })
    .trim()
    .min(1, `Type ${what}`)
    .max(160, "Keep the name under 160 characters");

/** A blank optional field is not given. */
const optional = <T extends z.ZodType>(schema: T) =>
  z.preprocess(
    (v) => (typeof v === "string" && v.trim() === "" ? undefined : v),
    schema.optional(),
  );

/** What a driver sends to accept an entry's waiver: their full name as typed, and for a minor
 *  the parent's or guardian's name and e-mail (checked as required on the server, where the age
 *  on the event date is known). */
export const signWaiverInputSchema = z.object({
  entryId: idSchema,
  signedName: fullName("your full name"),
  guardianName: optional(fullName("your parent's or guardian's full name")),
  guardianEmail: optional(emailSchema),
});
export type SignWaiverInput = z.infer<typeof signWaiverInputSchema>;

/** What a parent or guardian sends from the link they were e-mailed. */
export const acceptGuardianWaiverInputSchema = z.object({
  token: z.string().regex(/^[A-Za-z0-9_-]{43}$/, "This link is not complete"),
  guardianName: fullName("your full name"),
});
export type AcceptGuardianWaiverInput = z.infer<typeof acceptGuardianWaiverInputSchema>;
