import { z } from "zod";

export const emailSchema = z
  .string()
  .trim()
  .toLowerCase()
  .pipe(z.email({ message: "Enter an e-mail address like name@example.com" }).max(255));

export const passwordSignInSchema = z.object({
  email: emailSchema,
  password: z.string().min(1, "Enter your password").max(200, "That password is too long"),
});

export const emailSignInSchema = z.object({ email: emailSchema });
