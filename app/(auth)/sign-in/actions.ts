"use server";
import { headers } from "next/headers";
import { AuthError } from "next-auth";
import { z } from "zod";
import { signIn } from "@/auth";
import { clientAddress } from "@/lib/auth/client-address";
import { requestOriginProblem } from "@/lib/auth/request-origin-problem";
import { forgivePasswordAttempt, takeSignInAttempt } from "@/lib/auth/sign-in-limits";
import { emailSignInSchema, passwordSignInSchema } from "@/lib/auth/sign-in-schema";
import type { FieldErrors } from "@/lib/errors";
import { type ActionRefusal, defineAction } from "@/lib/http/define-action";
import { safeReturnPath } from "@/lib/http/safe-return-path";

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

const echo = (form: FormData) =>
  typeof form.get("email") === "string" ? String(form.get("email")) : "";
const refuse = ({ message, fields }: ActionRefusal, form: FormData): SignInState =>
  fields ? { fields, email: echo(form) } : { message, email: echo(form) };
const access = { public: "anyone may try to sign in; the sign-in limits count every try" };

/** Password sign-in. On success Auth.js redirects; on failure we say so without hinting which part was wrong. */
export const signInWithPassword = defineAction({
  fields: ["email", "password", "callbackUrl"],
  schema: passwordSignInSchema.extend({ callbackUrl: z.unknown() }),
  access,
  refuse,
  handler: async ({ email, password, callbackUrl }): Promise<SignInState> => {
    const request = await headers();
    // signIn() builds its redirect from the request's host headers: only APP_URL's may start it.
    const wrongOrigin = requestOriginProblem(request);
    if (wrongOrigin) return { message: wrongOrigin, email };
    // Counted before the password is checked, for known and unknown addresses alike.
    const who = { email, clientAddress: clientAddress(request) };
    const limit = await takeSignInAttempt("password", who);
    if (!limit.ok) return { message: limit.message, email };
    try {
      await signIn("credentials", { email, password, redirectTo: safeReturnPath(callbackUrl) });
    } catch (error) {
      if (error instanceof AuthError) {
        return { message: "That e-mail and password do not match an account.", email };
      }
      if (isRedirect(error)) await forgivePasswordAttempt(who);
      throw error; // the success redirect
    }
    return {};
  },
});

/** E-mail link sign-in: sends a one-time link through the club's mail server. */
export const signInWithEmailLink = defineAction({
  fields: ["email", "callbackUrl"],
  schema: emailSignInSchema.extend({ callbackUrl: z.unknown() }),
  access,
  refuse,
  handler: async ({ email, callbackUrl }): Promise<SignInState> => {
    const request = await headers();
    // signIn() builds the mailed link from the request's host headers: only APP_URL's may.
    const wrongOrigin = requestOriginProblem(request);
    if (wrongOrigin) return { message: wrongOrigin, email };
    const who = { email, clientAddress: clientAddress(request) };
    const limit = await takeSignInAttempt("link", who);
    if (!limit.ok) return { message: limit.message, email };
    try {
      await signIn("nodemailer", { email, redirectTo: safeReturnPath(callbackUrl) });
    } catch (error) {
      if (error instanceof AuthError) {
        return { message: "We could not send the link just now. Try again in a minute.", email };
      }
      throw error;
    }
    return {};
  },
});
