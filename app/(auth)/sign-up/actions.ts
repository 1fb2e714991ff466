"use server";
import { headers } from "next/headers";
import { redirect } from "next/navigation";
import { signUp } from "@/lib/accounts/sign-up";
import { clientAddress } from "@/lib/auth/client-address";
import { takeSignInAttempt } from "@/lib/auth/sign-in-limits";
import { linkSignUpSchema, passwordSignUpSchema } from "@/lib/auth/sign-up-schema";
import type { FieldErrors } from "@/lib/errors";
import { type ActionRefusal, defineAction } from "@/lib/http/define-action";
import { safeReturnPath } from "@/lib/http/safe-return-path";

export type SignUpState = {
  message?: string;
  fields?: FieldErrors;
  email?: string;
  fullName?: string;
};

const echo = (form: FormData) => ({
  email: typeof form.get("email") === "string" ? String(form.get("email")) : "",
  fullName: typeof form.get("fullName") === "string" ? String(form.get("fullName")) : "",
});
const refuse = ({ message, fields }: ActionRefusal, form: FormData): SignUpState =>
  fields ? { fields, ...echo(form) } : { message, ...echo(form) };
const access = {
  public:
    "anyone may ask for an account; the sign-in limits count every request, and the answer is the same whether or not the address has one",
};

/** Create an account with a password: the account e-mail confirms the address and signs in. */
export const signUpWithPassword = defineAction({
  fields: ["email", "fullName", "password", "callbackUrl"],
  schema: passwordSignUpSchema,
  access,
  refuse,
  handler: async ({ email, fullName, password, callbackUrl }): Promise<SignUpState> => {
    const who = { email, clientAddress: clientAddress(await headers()) };
    // The same limits as signing in: a password is set, and an e-mail is sent.
    for (const kind of ["password", "link"] as const) {
      const limit = await takeSignInAttempt(kind, who);
      if (!limit.ok) return { message: limit.message, email, fullName };
    }
    await signUp({ email, fullName, password, next: safeReturnPath(callbackUrl, "/profile") });
    redirect("/sign-up/check-email");
  },
});

/** Create an account that signs in by e-mail links only. */
export const signUpWithEmailLink = defineAction({
  fields: ["email", "fullName", "callbackUrl"],
  schema: linkSignUpSchema,
  access,
  refuse,
  handler: async ({ email, fullName, callbackUrl }): Promise<SignUpState> => {
    const who = { email, clientAddress: clientAddress(await headers()) };
    const limit = await takeSignInAttempt("link", who);
    if (!limit.ok) return { message: limit.message, email, fullName };
    await signUp({
      email,
      fullName,
      password: null,
      next: safeReturnPath(callbackUrl, "/profile"),
    });
    redirect("/sign-up/check-email");
  },
});
