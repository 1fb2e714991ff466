"use client";
import { useState } from "react";
import { FieldError } from "@/components/field-error";
import { makeRecord } from "@/lib/offline/make-record";
import { overrideClassChoices } from "@/lib/scrutineer/classes/override-class-choices";
import { overrideTargetProblem } from "@/lib/scrutineer/classes/override-target-problem";
import {
  type OverridePayload,
  RECORD_TEXT_LIMITS,
  recordSchema,
} from "@/lib/scrutineer/records/record-schema";
import type { Verdict } from "@/lib/scrutineer/verdicts/verdict-schema";
import { useTech } from "./tech-context";

type Status = OverridePayload["status"];
type Errors = { classId?: string[]; reason?: string[] };

/** The computed result under any override: what the chief is deciding about. */
function computedOf(verdict: Verdict | null): { status: Status; classId: string | null } | null {
  if (!verdict) return null;
  const status = verdict.override?.computedStatus ?? verdict.status;
  const classId = verdict.override ? verdict.override.computedClassId : verdict.classId;
  return { status: status === "moved-up" || status === "held" ? status : "cleared", classId };
}

/**
 * Override the computed verdict with a written reason. Offers only the classes that fit the
 * chosen outcome (cleared: the declared class; moved up: the classes above it) and checks with
 * the engine's own rule before saving, so an override is never silently ignored later.
 */
export function ChiefOverrideForm({
  entryId,
  declaredClassId,
  verdict,
}: {
  entryId: string;
  declaredClassId: string;
  verdict: Verdict | null;
}) {
  const { ruleSet, official, deviceId, record } = useTech();
  const classes = ruleSet.classes;
  const computed = computedOf(verdict);
  const choicesFor = (s: Status) => overrideClassChoices({ classes, declaredClassId, status: s });
  const pickClass = (s: Status, current: string) => {
    const choices = choicesFor(s);
    if (choices.some((c) => c.id === current)) return current;
    return (choices.find((c) => c.id === computed?.classId) ?? choices[0])?.id ?? "";
  };
  const [status, setStatus] = useState<Status>(computed?.status ?? "cleared");
  const [classId, setClassId] = useState(() =>
    pickClass(computed?.status ?? "cleared", computed?.classId ?? declaredClassId),
  );
  const [reason, setReason] = useState("");
  const [errors, setErrors] = useState<Errors>({});
  const [message, setMessage] = useState<string | null>(null);
  const choices = choicesFor(status);
  const declaredName = classes.find((c) => c.id === declaredClassId)?.name ?? declaredClassId;
  const noClassAbove =
    status === "moved-up" && choices.length === 0
      ? `${declaredName} is the highest class: there is no class to move this car up to.`
      : null;

  const changeStatus = (next: Status) => {
    setStatus(next);
    setClassId((current) => pickClass(next, current));
    setErrors({});
  };

  const submit = async () => {
    const payload = { status, classId: status === "held" ? null : classId || null, reason };
    const made = makeRecord({
      kind: "override",
      payload,
      entryId,
      officialId: official.id,
      deviceId,
      now: new Date(),
    });
    // The same schema the server checks each synced record with, then the engine's class rule.
    const parsed = recordSchema.safeParse(made);
    const issues = parsed.success ? [] : parsed.error.issues;
    const at = (field: string) => issues.filter((i) => i.path[1] === field).map((i) => i.message);
    const problem =
      noClassAbove ??
      overrideTargetProblem({ classes, declaredClassId, status, classId: payload.classId });
    const next: Errors = {};
    const classIssues = problem ? [problem] : at("classId");
    if (classIssues.length > 0) next.classId = classIssues;
    if (at("reason").length > 0) next.reason = at("reason");
    setErrors(next);
    if (next.classId || next.reason || !parsed.success) {
      setMessage("Not saved yet: see the messages above.");
      return;
    }
    await record(parsed.data);
    setReason("");
    setMessage("Override saved on this phone; it goes to the server with the outbox.");
  };

  return (
    <form
      className="space-y-2"
      aria-labelledby="override-title"
      onSubmit={(e) => {
        e.preventDefault();
        void submit();
      }}
      noValidate
    >
      <h3 id="override-title" className="text-xl font-bold">
        Override the verdict
      </h3>
      <div className="grid gap-2 sm:grid-cols-2">
        <label className="block">
          <span className="field-label">Decision</span>
          <select
            className="field-input"
            value={status}
            onChange={(e) => changeStatus(e.target.value as Status)}
            data-testid="override-status"
          >
            <option value="cleared">Cleared</option>
            <option value="moved-up">Moved up</option>
            <option value="held">Held</option>
          </select>
        </label>
        {status !== "held" ? (
          <label className="block">
            <span className="field-label">Class</span>
            <select
              className="field-input"
              value={classId}
              onChange={(e) => setClassId(e.target.value)}
              disabled={choices.length <= 1}
              aria-invalid={errors.classId ? true : undefined}
              aria-describedby={errors.classId ? "override-class-error" : undefined}
              data-testid="override-class"
            >
              {choices.length === 0 ? <option value="">No class fits</option> : null}
              {choices.map((c) => (
                <option key={c.id} value={c.id}>
                  {c.name}
                </option>
              ))}
            </select>
          </label>
        ) : null}
      </div>
      {noClassAbove && !errors.classId ? (
        <p className="font-semibold text-attention">{noClassAbove}</p>
      ) : null}
      <FieldError id="override-class-error" messages={errors.classId} />
      <label className="block">
        <span className="field-label">Reason (kept with your name)</span>
        <textarea
          className="field-input min-h-20 py-2"
          value={reason}
          onChange={(e) => setReason(e.target.value)}
          aria-invalid={errors.reason ? true : undefined}
          aria-describedby={errors.reason ? "override-reason-error" : undefined}
          data-testid="override-reason"
          maxLength={RECORD_TEXT_LIMITS.overrideReason}
        />
      </label>
      <FieldError id="override-reason-error" messages={errors.reason} />
      <button type="submit" className="btn-primary">
        Save override
      </button>
      {message ? (
        <p role="status" className="font-semibold" data-testid="override-message">
          {message}
        </p>
      ) : null}
    </form>
  );
}
