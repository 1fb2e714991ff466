"use client";
import { useMemo, useState } from "react";
import { FieldError } from "@/components/field-error";
import { makeRecord } from "@/lib/offline/make-record";
import {
  incomingRecordSchema,
  RECORD_TEXT_LIMITS,
  type TechRecord,
} from "@/lib/scrutineer/records/record-schema";
import { useTech } from "./tech-context";
import { voidChoices } from "./void-choices";

type Errors = { target?: string[]; reason?: string[] };

/**
 * Void a reading or checklist answer, with a written reason: the record stays on file and the
 * verdict is re-derived without it. The list is grouped by kind, newest first, with who and when.
 */
export function ChiefVoidForm({ entryId, records }: { entryId: string; records: TechRecord[] }) {
  const { ruleSet, pack, official, deviceId, record } = useTech();
  const groups = useMemo(
    () =>
      voidChoices({
        records,
        checklistLabel: (id) => ruleSet.safety.checklist.find((i) => i.id === id)?.label,
        officialName: (id) => pack.officials.find((o) => o.userId === id)?.name,
        unitSystem: pack.event.unitSystem,
        timeZone: pack.event.timeZone,
      }),
    [records, ruleSet, pack.officials, pack.event.unitSystem, pack.event.timeZone],
  );
  const [target, setTarget] = useState("");
  const [reason, setReason] = useState("");
  const [errors, setErrors] = useState<Errors>({});
  const [message, setMessage] = useState<string | null>(null);
  const open = groups.flatMap((g) => g.choices).filter((c) => !c.voided);

  const submit = async () => {
    const made = makeRecord({
      kind: "void",
      payload: { targetRecordId: target, reason },
      entryId,
      officialId: official.id,
      deviceId,
      now: new Date(),
    });
    // The same schema the server checks each synced record with.
    const parsed = incomingRecordSchema.safeParse(made);
    const next: Errors = {};
    if (!open.some((c) => c.id === target)) next.target = ["Pick the reading or answer to void."];
    const reasonIssues = parsed.success
      ? []
      : parsed.error.issues.filter((i) => i.path[1] === "reason").map((i) => i.message);
    if (reasonIssues.length > 0) next.reason = reasonIssues;
    setErrors(next);
    if (next.target || next.reason || !parsed.success) {
      setMessage("Not saved yet: see the messages above.");
      return;
    }
    await record(parsed.data);
    setTarget("");
    setReason("");
    setMessage("Void saved on this phone; it goes to the server with the outbox.");
  };

  return (
    <form
      className="space-y-2"
      aria-labelledby="void-title"
      onSubmit={(e) => {
        e.preventDefault();
        void submit();
      }}
      noValidate
    >
      <h3 id="void-title" className="text-xl font-bold">
        Void a reading or answer
      </h3>
      <label className="block">
        <span className="field-label">Reading or answer</span>
        <select
          className="field-input"
          value={target}
          onChange={(e) => setTarget(e.target.value)}
          aria-invalid={errors.target ? true : undefined}
          aria-describedby={errors.target ? "void-target-error" : undefined}
          data-testid="void-target"
        >
          <option value="">
            {open.length === 0 ? "Nothing recorded to void" : "Pick one (newest first)"}
          </option>
          {groups.map((g) => (
            <optgroup key={g.key} label={g.label}>
              {g.choices.map((c) => (
                <option key={c.id} value={c.id} disabled={c.voided}>
                  {c.label}
                </option>
              ))}
            </optgroup>
          ))}
        </select>
      </label>
      <FieldError id="void-target-error" messages={errors.target} />
      <label className="block">
        <span className="field-label">Why it is void</span>
        <input
          className="field-input"
          value={reason}
          onChange={(e) => setReason(e.target.value)}
          aria-invalid={errors.reason ? true : undefined}
          aria-describedby={errors.reason ? "void-reason-error" : undefined}
          data-testid="void-reason"
          maxLength={RECORD_TEXT_LIMITS.voidReason}
        />
      </label>
      <FieldError id="void-reason-error" messages={errors.reason} />
      <button type="submit" className="btn-secondary">
        Void it
      </button>
      {message ? (
        <p role="status" className="font-semibold" data-testid="void-message">
          {message}
        </p>
      ) : null}
    </form>
  );
}
