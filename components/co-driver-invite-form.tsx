"use client";
import { useActionState } from "react";
import type { FieldErrors } from "@/lib/errors";
import { FieldError } from "./field-error";

export type InviteCoDriverState = {
  status: "idle" | "error" | "done";
  message?: string;
  fields?: FieldErrors;
};

/** The entrant invites a co-driver by e-mail (again: a new invitation closes the old one). */
export function CoDriverInviteForm({
  entryId,
  again,
  action,
}: {
  entryId: string;
  again: boolean;
  action: (state: InviteCoDriverState, form: FormData) => Promise<InviteCoDriverState>;
}) {
  const [state, formAction, pending] = useActionState(action, { status: "idle" });
  return (
    <form action={formAction} className="space-y-2" data-testid="co-driver-invite-form">
      <input type="hidden" name="entryId" value={entryId} />
      <label htmlFor="co-driver-email" className="field-label">
        {again ? "Invite someone (again)" : "Invite a co-driver"}: their e-mail
      </label>
      <input
        id="co-driver-email"
        name="coDriverEmail"
        type="email"
        className="field-input"
        required
        maxLength={320}
        autoComplete="off"
        aria-invalid={state.fields?.coDriverEmail ? true : undefined}
        aria-describedby="co-driver-email-error"
      />
      <FieldError id="co-driver-email-error" messages={state.fields?.coDriverEmail} />
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
        {pending ? "Sending…" : "Send the invitation"}
      </button>
    </form>
  );
}
