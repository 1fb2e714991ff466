"use client";
import { useActionState } from "react";
import { FieldError } from "../field-error";
import type { FormState } from "../form-state";

/** A driver accepts the waiver by typing their full name; a minor also names a parent or
 *  guardian. The server checks the name against the profile and the age on the event date. */
export function WaiverSignForm({
  entryId,
  minor,
  renewing,
  action,
}: {
  entryId: string;
  /** Under 18 on the event date: ask for a parent's or guardian's name and e-mail. */
  minor: boolean;
  /** Already signed, the guardian not yet: the form sends the guardian's request again. */
  renewing: boolean;
  action: (state: FormState, form: FormData) => Promise<FormState>;
}) {
  const [state, formAction, pending] = useActionState(action, { status: "idle" });
  const field = (name: string) => state.fields?.[name];
  return (
    <form action={formAction} className="card space-y-4" data-testid="waiver-sign-form">
      <input type="hidden" name="entryId" value={entryId} />
      <div>
        <label htmlFor="waiver-name" className="field-label">
          {renewing ? "Your full name" : "Type your full name to accept the waiver"}
        </label>
        <input
          id="waiver-name"
          name="signedName"
          className="field-input"
          autoComplete="name"
          required
          maxLength={160}
          aria-invalid={field("signedName") ? true : undefined}
          aria-describedby="waiver-name-error"
        />
        <FieldError id="waiver-name-error" messages={field("signedName")} />
      </div>
      {minor ? (
        <fieldset className="space-y-4">
          <legend className="text-base font-semibold">
            You are under 18 on the event date, so a parent or guardian must accept the waiver too.
            We e-mail them a link; they need no account.
          </legend>
          <div>
            <label htmlFor="guardian-name" className="field-label">
              Parent&apos;s or guardian&apos;s full name
            </label>
            <input
              id="guardian-name"
              name="guardianName"
              className="field-input"
              required
              maxLength={160}
              aria-invalid={field("guardianName") ? true : undefined}
              aria-describedby="guardian-name-error"
            />
            <FieldError id="guardian-name-error" messages={field("guardianName")} />
          </div>
          <div>
            <label htmlFor="guardian-email" className="field-label">
              Their e-mail address
            </label>
            <input
              id="guardian-email"
              name="guardianEmail"
              type="email"
              inputMode="email"
              className="field-input"
              required
              maxLength={320}
              aria-invalid={field("guardianEmail") ? true : undefined}
              aria-describedby="guardian-email-error"
            />
            <FieldError id="guardian-email-error" messages={field("guardianEmail")} />
          </div>
        </fieldset>
      ) : null}
      {state.status === "error" && !state.fields ? (
        <p className="field-error" role="alert">
          {state.message}
        </p>
      ) : null}
      {state.status === "done" ? (
        <p className="font-semibold text-cleared" role="status" data-testid="waiver-done">
          {state.message}
        </p>
      ) : null}
      <button type="submit" className="btn-primary w-full sm:w-auto" disabled={pending}>
        {pending
          ? "Sending…"
          : renewing
            ? "Send the request again"
            : minor
              ? "Sign and ask my parent or guardian"
              : "I accept the waiver"}
      </button>
    </form>
  );
}
