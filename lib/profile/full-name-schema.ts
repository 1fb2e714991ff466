import { z } from "zod";

/** Longest full name kept (users.name holds 255; 120 is ample for any name on a licence). */
export const FULL_NAME_MAX = 120;

/** A person's name as given: inner runs of spaces made one, trimmed, 2–120 characters. */
export function personNameSchema(missing: string) {
  return z
    .string({ error: missing })
    .transform((value) => value.replace(/\s+/g, " ").trim())
    .pipe(
      z
        .string()
        .min(2, missing)
        .max(FULL_NAME_MAX, `Keep the name to ${FULL_NAME_MAX} characters`)
        .refine((v) => !/[<>@]/.test(v), "A name has no <, > or @ in it"),
    );
}

/** The person's own full name. */
export const fullNameSchema = personNameSchema("Enter your full name");
