import { z } from "zod";
import { fullNameSchema } from "../profile/full-name-schema";
import { newPasswordSchema } from "./new-password-schema";
import { emailSchema } from "./sign-in-schema";

/** Create an account with a password: address, full name, password. */
export const passwordSignUpSchema = z.object({
  email: emailSchema,
  fullName: fullNameSchema,
  password: newPasswordSchema,
  /** Where to go once the address is confirmed (a same-site path, else the profile). */
  callbackUrl: z.string().max(2000).optional(),
});

/** Create an account with an e-mail link only: address and full name. */
export const linkSignUpSchema = z.object({
  email: emailSchema,
  fullName: fullNameSchema,
  callbackUrl: z.string().max(2000).optional(),
});
