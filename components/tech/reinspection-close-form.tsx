"use client";
import { useActionState } from "react";
import { CarNumberChip } from "@/components/car-number-chip";
import { FieldError } from "@/components/field-error";
import type { FieldErrors } from "@/lib/errors";

export type CloseReinspectionState = {
  status: "idle" | "error" | "done";
  message?: string;
  fields?: FieldErrors;
  /** What the chief typed, kept when the server refuses (a refused form is not emptied). */
  note?: string;
};

/** One open re-inspection on the chief scrutineer's page, with the form that closes it. The server
 *  refuses until a scrutineer has recorded something on the car since it was sent back. */
export function ReinspectionCloseForm({
  eventId,
  reinspection,
  action,
}: {
  eventId: string;
  reinspection: {
    id: string;
    carNumber: number;
    cause: string;
    askedBy: string;
    askedAtText: string;
    reason: string;
  };
  action: (state: CloseReinspectionState, formData: FormData) => Promise<CloseReinspectionState>;
}) {
  const [state, formAction, pending] = useActionState(action, { status: "idle" });
  const noteId = `close-note-${reinspection.id}`;
  return (
    <form
      action={formAction}
      className="card space-y-3"
      data-testid="reinspection"
      data-car-number={reinspection.carNumber}
    >
      <p className="flex flex-wrap items-center gap-3 text-lg">
        <CarNumberChip carNumber={reinspection.carNumber} small />
        <span>
          Sent back ({reinspection.cause}) by <strong>{reinspection.askedBy}</strong> at{" "}
          <span className="tabular">{reinspection.askedAtText}</span>: {reinspection.reason}
        </span>
      </p>
      <input type="hidden" name="eventId" value={eventId} />
      <input type="hidden" name="reinspectionId" value={reinspection.id} />
      <div>
        <label htmlFor={noteId} className="field-label">
          What the re-inspection found
        </label>
        <input
          key={`${state.status}:${state.message ?? ""}`}
          defaultValue={state.status === "error" ? state.note : ""}
          id={noteId}
          name="note"
          className="field-input"
          required
          minLength={3}
          maxLength={1000}
          aria-invalid={state.fields?.note ? true : undefined}
          aria-describedby={`${noteId}-error`}
        />
        <FieldError id={`${noteId}-error`} messages={state.fields?.note} />
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
      <button type="submit" className="btn-primary" disabled={pending}>
        {pending ? "Closing…" : "Close the re-inspection"}
      </button>
    </form>
  );
}
