"use client";
import { useActionState } from "react";
import type { SignUpState } from "@/app/(auth)/sign-up/actions";
import { FieldError } from "./field-error";

type Action = (prev: SignUpState, form: FormData) => Promise<SignUpState>;

function Field({
  id,
  name,
  label,
  type = "text",
  autoComplete,
  state,
  hint,
}: {
  id: string;
  name: "email" | "fullName" | "password";
  label: string;
  type?: string;
  autoComplete: string;
  state: SignUpState;
  hint?: string;
}) {
  const messages = state.fields?.[name];
  return (
    <div>
      <label htmlFor={id} className="field-label">
        {label}
      </label>
      {hint ? (
        <p id={`${id}-hint`} className="text-base text-asphalt-700">
          {hint}
        </p>
      ) : null}
      <input
        id={id}
        name={name}
        type={type}
        autoComplete={autoComplete}
        inputMode={type === "email" ? "email" : undefined}
        className="field-input"
        defaultValue={name === "password" ? undefined : state[name]}
        aria-invalid={messages ? true : undefined}
        aria-describedby={`${id}-error${hint ? ` ${id}-hint` : ""}`}
      />
      <FieldError id={`${id}-error`} messages={messages} />
    </div>
  );
}

/** Two ways to create an account: with a password, or with e-mail links only. */
export function SignUpForms({
  passwordAction,
  emailAction,
  callbackUrl,
}: {
  passwordAction: Action;
  emailAction: Action;
  /** Where to go once confirmed (a same-site path), carried through the account e-mail. */
  callbackUrl?: string;
}) {
  const [pw, submitPassword, pwPending] = useActionState(passwordAction, {});
  const [link, submitLink, linkPending] = useActionState(emailAction, {});
  return (
    <div className="grid gap-6 md:grid-cols-2">
      <form
        action={submitPassword}
        className="card space-y-4"
        noValidate
        aria-labelledby="signup-pw-title"
      >
        {callbackUrl ? <input type="hidden" name="callbackUrl" value={callbackUrl} /> : null}
        <h2 id="signup-pw-title" className="text-xl font-bold">
          With a password
        </h2>
        <Field
          id="signup-pw-name"
          name="fullName"
          label="Full name"
          autoComplete="name"
          state={pw}
        />
        <Field
          id="signup-pw-email"
          name="email"
          label="E-mail"
          type="email"
          autoComplete="email"
          state={pw}
        />
        <Field
          id="signup-pw-password"
          name="password"
          label="Password"
          type="password"
          autoComplete="new-password"
          state={pw}
          hint="At least 8 characters. A phrase of a few words is easy to remember."
        />
        {pw.message ? (
          <p className="field-error" role="alert">
            {pw.message}
          </p>
        ) : null}
        <button type="submit" className="btn-primary w-full" disabled={pwPending}>
          {pwPending ? "Creating…" : "Create account"}
        </button>
      </form>

      <form
        action={submitLink}
        className="card space-y-4"
        noValidate
        aria-labelledby="signup-link-title"
      >
        {callbackUrl ? <input type="hidden" name="callbackUrl" value={callbackUrl} /> : null}
        <h2 id="signup-link-title" className="text-xl font-bold">
          With e-mail links only
        </h2>
        <p className="text-base text-asphalt-800">
          No password: each time, we e-mail you a link that signs you in.
        </p>
        <Field
          id="signup-link-name"
          name="fullName"
          label="Full name"
          autoComplete="name"
          state={link}
        />
        <Field
          id="signup-link-email"
          name="email"
          label="E-mail"
          type="email"
          autoComplete="email"
          state={link}
        />
        {link.message ? (
          <p className="field-error" role="alert">
            {link.message}
          </p>
        ) : null}
        <button type="submit" className="btn-primary w-full" disabled={linkPending}>
          {linkPending ? "Sending…" : "E-mail me a link"}
        </button>
      </form>
    </div>
  );
}
