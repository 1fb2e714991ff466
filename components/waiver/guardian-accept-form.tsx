"use client";
import { useActionState } from "react";
import { FieldError } from "../field-error";
import type { FormState } from "../form-state";

/** A parent or guardian accepts a minor's waiver by typing their full name (no account). */
export function GuardianAcceptForm({
  token,
  minorName,
  action,
}: {
  token: string;
  minorName: string;
  action: (state: FormState, form: FormData) => Promise<FormState>;
}) {
  const [state, formAction, pending] = useActionState(action, { status: "idle" });
  if (state.status === "done") {
    return (
      <p className="card font-semibold text-cleared" role="status" data-testid="guardian-done">
        {state.message}
      </p>
    );
  }
  return (
    <form action={formAction} className="card space-y-4" data-testid="guardian-accept-form">
      <input type="hidden" name="token" value={token} />
      <div>
        <label htmlFor="guardian-name" className="field-label">
          Type your full name to accept the waiver for {minorName}
        </label>
        <input
          id="guardian-name"
          name="guardianName"
          className="field-input"
          autoComplete="name"
          required
          maxLength={160}
          aria-invalid={state.fields?.guardianName ? true : undefined}
          aria-describedby="guardian-name-error"
        />
        <FieldError id="guardian-name-error" messages={state.fields?.guardianName} />
      </div>
      {state.status === "error" && !state.fields ? (
        <p className="field-error" role="alert">
          {state.message}
        </p>
      ) : null}
      <button type="submit" className="btn-primary w-full sm:w-auto" disabled={pending}>
        {pending ? "Sending…" : "I accept, as parent or guardian"}
      </button>
    </form>
  );
}
