"use client";
import { useActionState } from "react";
import { experienceLabels } from "@/lib/entries/experience-labels";
import type { FieldErrors } from "@/lib/errors";
import { experienceLevels } from "@/lib/paddock/drive";
import { FieldError } from "./field-error";

export type InviteAnswerState = {
  status: "idle" | "error";
  message?: string;
  fields?: FieldErrors;
};

type Action = (state: InviteAnswerState, form: FormData) => Promise<InviteAnswerState>;

/** Accept (with your own estimate and experience) or decline a co-driver invitation. */
export function InviteAnswerForm({
  token,
  accept,
  decline,
  defaultExperience,
}: {
  token: string;
  /** The experience the profile gives, offered first. */
  defaultExperience?: string | null;
  accept: Action;
  decline: Action;
}) {
  const [acceptState, acceptAction, accepting] = useActionState(accept, { status: "idle" });
  const [declineState, declineAction, declining] = useActionState(decline, { status: "idle" });
  const fields = acceptState.fields;
  return (
    <div className="space-y-4">
      <form action={acceptAction} className="card space-y-4" data-testid="accept-invite-form">
        <h2 className="text-xl font-bold">Accept</h2>
        <input type="hidden" name="token" value={token} />
        <div>
          <label htmlFor="invite-lap-time" className="field-label">
            Your lap-time estimate at this circuit (minutes:seconds)
          </label>
          <input
            id="invite-lap-time"
            name="lapTime"
            className="field-input"
            inputMode="decimal"
            placeholder="1:55"
            required
            maxLength={12}
            aria-invalid={fields?.lapTime ? true : undefined}
            aria-describedby="invite-lap-time-error"
          />
          <FieldError id="invite-lap-time-error" messages={fields?.lapTime} />
        </div>
        <div>
          <label htmlFor="invite-experience" className="field-label">
            Your experience
          </label>
          <select
            id="invite-experience"
            name="experience"
            className="field-input"
            defaultValue={defaultExperience ?? ""}
            required
            aria-invalid={fields?.experience ? true : undefined}
            aria-describedby="invite-experience-error"
          >
            <option value="" disabled>
              Choose…
            </option>
            {experienceLevels.map((level) => (
              <option key={level} value={level}>
                {experienceLabels[level]}
              </option>
            ))}
          </select>
          <FieldError id="invite-experience-error" messages={fields?.experience} />
        </div>
        {acceptState.status === "error" && !fields ? (
          <p className="field-error" role="alert">
            {acceptState.message}
          </p>
        ) : null}
        <button type="submit" className="btn-primary" disabled={accepting}>
          {accepting ? "Accepting…" : "Accept and co-drive"}
        </button>
      </form>
      <form action={declineAction} className="card space-y-2" data-testid="decline-invite-form">
        <input type="hidden" name="token" value={token} />
        {declineState.status === "error" ? (
          <p className="field-error" role="alert">
            {declineState.message}
          </p>
        ) : null}
        <button type="submit" className="btn-secondary" disabled={declining}>
          {declining ? "Declining…" : "Decline"}
        </button>
      </form>
    </div>
  );
}
