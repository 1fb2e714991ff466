"use client";
import { useActionState } from "react";
import type { SignInState } from "@/app/(auth)/sign-in/actions";
import { FieldError } from "./field-error";

type Action = (prev: SignInState, form: FormData) => Promise<SignInState>;

export function SignInForms({
  callbackUrl,
  passwordAction,
  emailAction,
}: {
  callbackUrl: string;
  passwordAction: Action;
  emailAction: Action;
}) {
  const [pw, submitPassword, pwPending] = useActionState(passwordAction, {});
  const [link, submitLink, linkPending] = useActionState(emailAction, {});
  return (
    <div className="grid gap-6 md:grid-cols-2">
      <form action={submitLink} className="card space-y-4" noValidate aria-labelledby="link-title">
        <h2 id="link-title" className="text-xl font-bold">
          Get a sign-in link
        </h2>
        <p className="text-base text-asphalt-800">
          We e-mail you a link that works once. No password needed.
        </p>
        <input type="hidden" name="callbackUrl" value={callbackUrl} />
        <div>
          <label htmlFor="link-email" className="field-label">
            E-mail
          </label>
          <input
            id="link-email"
            name="email"
            type="email"
            autoComplete="email"
            inputMode="email"
            className="field-input"
            defaultValue={link.email}
            aria-invalid={link.fields?.email ? true : undefined}
            aria-describedby="link-email-error"
          />
          <FieldError id="link-email-error" messages={link.fields?.email} />
        </div>
        {link.message ? <p className="field-error">{link.message}</p> : null}
        <button type="submit" className="btn-primary w-full" disabled={linkPending}>
          {linkPending ? "Sending…" : "E-mail me a link"}
        </button>
      </form>

      <form
        action={submitPassword}
        className="card space-y-4"
        noValidate
        aria-labelledby="pw-title"
      >
        <h2 id="pw-title" className="text-xl font-bold">
          Sign in with a password
        </h2>
        <input type="hidden" name="callbackUrl" value={callbackUrl} />
        <div>
          <label htmlFor="pw-email" className="field-label">
            E-mail
          </label>
          <input
            id="pw-email"
            name="email"
            type="email"
            autoComplete="username"
            inputMode="email"
            className="field-input"
            defaultValue={pw.email}
            aria-invalid={pw.fields?.email ? true : undefined}
            aria-describedby="pw-email-error"
          />
          <FieldError id="pw-email-error" messages={pw.fields?.email} />
        </div>
        <div>
          <label htmlFor="pw-password" className="field-label">
            Password
          </label>
          <input
            id="pw-password"
            name="password"
            type="password"
            autoComplete="current-password"
            className="field-input"
            aria-invalid={pw.fields?.password ? true : undefined}
            aria-describedby="pw-password-error"
          />
          <FieldError id="pw-password-error" messages={pw.fields?.password} />
        </div>
        {pw.message ? (
          <p className="field-error" role="alert">
            {pw.message}
          </p>
        ) : null}
        <button type="submit" className="btn-primary w-full" disabled={pwPending}>
          {pwPending ? "Signing in…" : "Sign in"}
        </button>
      </form>
    </div>
  );
}
