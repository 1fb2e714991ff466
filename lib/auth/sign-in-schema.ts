import { z } from "zod";
import { normalizeEmail } from "./normalize-email";

const EMAIL_MESSAGE = "Enter an e-mail address like name@example.com";

/** An e-mail address as typed, normalized once (lib/auth/normalize-email.ts) or refused. */
export const emailSchema = z
  .string({ error: EMAIL_MESSAGE })
  .max(320, EMAIL_MESSAGE)
  .transform((value, ctx) => {
    const email = normalizeEmail(value);
    if (email === null) {
      ctx.addIssue({ code: "custom", message: EMAIL_MESSAGE });
      return z.NEVER;
    }
    return email;
  });

export const passwordSignInSchema = z.object({
  email: emailSchema,
  password: z.string().min(1, "Enter your password").max(200, "That password is too long"),
});

export const emailSignInSchema = z.object({ email: emailSchema });
