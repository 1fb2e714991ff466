"use client";
import { useActionState } from "react";
import type { FieldErrors } from "@/lib/errors";
import { FieldError } from "./field-error";

export type RevokePassState = {
  status: "idle" | "error" | "done";
  message?: string;
  fields?: FieldErrors;
};

/** The organizer's "revoke this pass" form on the pass check page; the server action checks the
 *  permission and the pass again. */
export function PassRevokeForm({
  token,
  action,
}: {
  token: string;
  action: (state: RevokePassState, formData: FormData) => Promise<RevokePassState>;
}) {
  const [state, formAction, pending] = useActionState(action, { status: "idle" });
  return (
    <form action={formAction} className="card space-y-3" data-testid="pass-revoke-form">
      <h2 className="text-xl font-bold">Revoke this pass</h2>
      <p className="text-base text-asphalt-800">
        Phones refuse it once their event pack is refreshed. The entrant gets a fresh pass the next
        time they open theirs; to bar the entry, withdraw it.
      </p>
      <input type="hidden" name="token" value={token} />
      <div>
        <label htmlFor="revoke-reason" className="field-label">
          Reason
        </label>
        <input
          id="revoke-reason"
          name="reason"
          className="field-input"
          required
          minLength={3}
          maxLength={300}
          placeholder="Pass shared with another car"
          aria-invalid={state.fields?.reason ? true : undefined}
          aria-describedby="revoke-reason-error"
        />
        <FieldError id="revoke-reason-error" messages={state.fields?.reason} />
      </div>
      {state.status === "error" && !state.fields ? (
        <p className="field-error" role="alert">
          {state.message}
        </p>
      ) : null}
      {state.status === "done" ? (
        <p className="font-semibold text-cleared" role="status">
          {state.message}
        </p>
      ) : null}
      <button type="submit" className="btn-secondary" disabled={pending}>
        {pending ? "Revoking…" : "Revoke pass"}
      </button>
    </form>
  );
}
