"use server";
import { AuthError } from "next-auth";
import { signIn } from "@/auth";
import { emailSignInSchema, passwordSignInSchema } from "@/lib/auth/sign-in-schema";
import type { FieldErrors } from "@/lib/errors";
import { safeReturnPath } from "@/lib/http/safe-return-path";
import { zodFieldErrors } from "@/lib/http/zod-field-errors";

export type SignInState = { message?: string; fields?: FieldErrors; email?: string };

/** Password sign-in. On success Auth.js redirects; on failure we say so without hinting which part was wrong. */
export async function signInWithPassword(_prev: SignInState, form: FormData): Promise<SignInState> {
  const parsed = passwordSignInSchema.safeParse({
    email: form.get("email"),
    password: form.get("password"),
  });
  const email = typeof form.get("email") === "string" ? String(form.get("email")) : "";
  if (!parsed.success) return { fields: zodFieldErrors(parsed.error), email };
  try {
    await signIn("credentials", {
      ...parsed.data,
      redirectTo: safeReturnPath(form.get("callbackUrl")),
    });
  } catch (error) {
    if (error instanceof AuthError) {
      return { message: "That e-mail and password do not match an account.", email };
    }
    throw error; // the success redirect
  }
  return {};
}

/** E-mail link sign-in: sends a one-time link through the club's mail server. */
export async function signInWithEmailLink(
  _prev: SignInState,
  form: FormData,
): Promise<SignInState> {
  const parsed = emailSignInSchema.safeParse({ email: form.get("email") });
  const email = typeof form.get("email") === "string" ? String(form.get("email")) : "";
  if (!parsed.success) return { fields: zodFieldErrors(parsed.error), email };
  try {
    await signIn("nodemailer", {
      email: parsed.data.email,
      redirectTo: safeReturnPath(form.get("callbackUrl")),
    });
  } catch (error) {
    if (error instanceof AuthError) {
      return { message: "We could not send the link just now. Try again in a minute.", email };
    }
    throw error;
  }
  return {};
}
