"use server";
import { headers } from "next/headers";
import { AuthError } from "next-auth";
import { signIn } from "@/auth";
import { clientAddress } from "@/lib/auth/client-address";
import { requestOriginProblem } from "@/lib/auth/request-origin-problem";
import { forgivePasswordAttempt, takeSignInAttempt } from "@/lib/auth/sign-in-limits";
import { emailSignInSchema, passwordSignInSchema } from "@/lib/auth/sign-in-schema";
import type { FieldErrors } from "@/lib/errors";
import { safeReturnPath } from "@/lib/http/safe-return-path";
import { zodFieldErrors } from "@/lib/http/zod-field-errors";

export type SignInState = { message?: string; fields?: FieldErrors; email?: string };

/** Next's redirect() is thrown; it is how a successful signIn() ends. */
function isRedirect(error: unknown): boolean {
  return (
    typeof error === "object" &&
    error !== null &&
    "digest" in error &&
    String(error.digest).startsWith("NEXT_REDIRECT")
  );
}

/** Password sign-in. On success Auth.js redirects; on failure we say so without hinting which part was wrong. */
export async function signInWithPassword(_prev: SignInState, form: FormData): Promise<SignInState> {
  const parsed = passwordSignInSchema.safeParse({
    email: form.get("email"),
    password: form.get("password"),
  });
  const email = typeof form.get("email") === "string" ? String(form.get("email")) : "";
  if (!parsed.success) return { fields: zodFieldErrors(parsed.error), email };
  const request = await headers();
  // signIn() builds its redirect from the request's host headers: only APP_URL's may start it.
  const wrongOrigin = requestOriginProblem(request);
  if (wrongOrigin) return { message: wrongOrigin, email };
  // Counted before the password is checked, for known and unknown addresses alike.
  const who = { email: parsed.data.email, clientAddress: clientAddress(request) };
  const limit = await takeSignInAttempt("password", who);
  if (!limit.ok) return { message: limit.message, email };
  try {
    await signIn("credentials", {
      ...parsed.data,
      redirectTo: safeReturnPath(form.get("callbackUrl")),
    });
  } catch (error) {
    if (error instanceof AuthError) {
      return { message: "That e-mail and password do not match an account.", email };
    }
    if (isRedirect(error)) await forgivePasswordAttempt(who);
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
  const request = await headers();
  // signIn() builds the mailed link from the request's host headers: only APP_URL's may.
  const wrongOrigin = requestOriginProblem(request);
  if (wrongOrigin) return { message: wrongOrigin, email };
  const who = { email: parsed.data.email, clientAddress: clientAddress(request) };
  const limit = await takeSignInAttempt("link", who);
  if (!limit.ok) return { message: limit.message, email };
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
