"use client";
import { useState } from "react";
import type { FieldErrors } from "@/lib/errors";
import { FieldError } from "../field-error";

const causes = [
  { value: "incident", label: "Incident" },
  { value: "protest", label: "Protest" },
  { value: "other", label: "Other" },
] as const;

/**
 * "Ask for re-inspection" on one car: cause, who asked and why. The car's verdict goes back to
 * Waiting until the chief scrutineer closes the re-inspection; its run-group place is flagged.
 */
export function ReinspectionForm({
  entryId,
  carNumber,
  pending,
  fields,
  onAsk,
}: {
  entryId: string;
  carNumber: number;
  pending: boolean;
  fields: FieldErrors | undefined;
  onAsk: (form: { entryId: string; cause: string; askedBy: string; reason: string }) => void;
}) {
  const [open, setOpen] = useState(false);
  const id = `reinspect-${entryId}`;
  if (!open) {
    return (
      <button type="button" className="btn-secondary" onClick={() => setOpen(true)}>
        Ask for re-inspection
      </button>
    );
  }
  return (
    <form
      className="space-y-2 rounded-lg border-2 border-asphalt-400 p-3"
      aria-label={`Ask for re-inspection of car ${carNumber}`}
      data-testid="reinspection-form"
      onSubmit={(event) => {
        event.preventDefault();
        const data = new FormData(event.currentTarget);
        onAsk({
          entryId,
          cause: String(data.get("cause") ?? ""),
          askedBy: String(data.get("askedBy") ?? "").trim(),
          reason: String(data.get("reason") ?? "").trim(),
        });
      }}
    >
      <fieldset>
        <legend className="field-label">Cause</legend>
        <div className="flex flex-wrap gap-3">
          {causes.map((c) => (
            <label
              key={c.value}
              className="flex min-h-touch items-center gap-2 text-base font-semibold"
            >
              <input
                type="radio"
                name="cause"
                value={c.value}
                defaultChecked={c.value === "incident"}
                className="size-6"
              />
              {c.label}
            </label>
          ))}
        </div>
      </fieldset>
      <label className="field-label">
        Who asked
        <input
          name="askedBy"
          required
          maxLength={255}
          className="field-input"
          aria-describedby={`${id}-asked`}
        />
      </label>
      <FieldError id={`${id}-asked`} messages={fields?.askedBy} />
      <label className="field-label">
        Reason
        <textarea
          name="reason"
          required
          maxLength={1000}
          rows={2}
          className="field-input py-2"
          aria-describedby={`${id}-reason`}
        />
      </label>
      <FieldError id={`${id}-reason`} messages={fields?.reason} />
      <p className="text-base">
        The car waits until the chief scrutineer has seen it again; keep it off track meanwhile.
      </p>
      <div className="flex flex-wrap gap-2">
        <button type="submit" className="btn-primary" disabled={pending}>
          Send car {carNumber} back to tech
        </button>
        <button type="button" className="btn-secondary" onClick={() => setOpen(false)}>
          Cancel
        </button>
      </div>
    </form>
  );
}
