"use client";
import { useActionState } from "react";
import type { FieldErrors } from "@/lib/errors";
import { Caution } from "../caution";
import { FieldError } from "../field-error";

export type PinRuleSetState = {
  status: "idle" | "error" | "done";
  message?: string;
  fields?: FieldErrors;
};

/** Pin a saved rule-set version to the event, after a confirmation. */
export function PinRuleSetForm({
  eventId,
  versionId,
  version,
  action,
}: {
  eventId: string;
  versionId: string;
  version: number;
  action: (state: PinRuleSetState, formData: FormData) => Promise<PinRuleSetState>;
}) {
  const [state, formAction, pending] = useActionState(action, { status: "idle" });
  return (
    <form action={formAction} className="card space-y-3" data-testid="pin-rule-set-form">
      <h3 className="text-xl font-bold">Judge this event by version {version}</h3>
      <Caution title="Before you pin">
        Every verdict is worked out again from the readings already taken, and drivers whose verdict
        changes are e-mailed. Phones keep previewing with the old version until their event pack is
        refreshed. A version, once pinned, can never be edited. The sanctioning body&apos;s rulebook
        governs; agree the change with the chief scrutineer first.
      </Caution>
      <input type="hidden" name="eventId" value={eventId} />
      <input type="hidden" name="versionId" value={versionId} />
      <label className="flex min-h-touch items-center gap-3 text-base font-semibold">
        <input
          type="checkbox"
          name="confirm"
          value="yes"
          className="size-6"
          aria-describedby="pin-confirm-error"
        />
        The chief scrutineer knows, and the change follows the rulebook.
      </label>
      <FieldError id="pin-confirm-error" messages={state.fields?.confirm} />
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
      <button type="submit" className="btn-primary" disabled={pending}>
        {pending ? "Pinning…" : `Pin version ${version}`}
      </button>
    </form>
  );
}
