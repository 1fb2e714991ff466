"use client";
import { useState } from "react";
import { makeRecord } from "@/lib/offline/make-record";
import type { TechRecord } from "@/lib/scrutineer/records/record-schema";
import { RECORD_TEXT_LIMITS } from "@/lib/scrutineer/records/record-schema";
import { useTech } from "./tech-context";

/**
 * Take back one of your own records (a typo, a wrong car) with a written reason. The record stays
 * on file; a new void record cancels it. Another official's record is the chief scrutineer's.
 */
export function VoidOwnRecord({ target, what }: { target: TechRecord; what: string }) {
  const { official, deviceId, record, canWrite } = useTech();
  const [open, setOpen] = useState(false);
  const [reason, setReason] = useState("");
  const [error, setError] = useState<string | null>(null);
  if (target.officialId !== official.id || !canWrite) return null;

  const save = async () => {
    if (reason.trim().length < 3) return setError("Write why it is void (a few words).");
    setError(null);
    await record(
      makeRecord({
        kind: "void",
        payload: { targetRecordId: target.id, reason: reason.trim() },
        entryId: target.entryId,
        officialId: official.id,
        deviceId,
        now: new Date(),
      }),
    );
    setReason("");
    setOpen(false);
  };

  if (!open) {
    return (
      <button
        type="button"
        className="btn-secondary min-h-touch px-3"
        onClick={() => setOpen(true)}
        aria-label={`Void ${what}`}
        data-testid="void-own"
      >
        Void…
      </button>
    );
  }
  return (
    <form
      className="mt-2 w-full space-y-2 rounded-lg border-2 border-asphalt-400 bg-asphalt-50 p-2"
      onSubmit={(e) => {
        e.preventDefault();
        void save();
      }}
      data-testid="void-own-form"
    >
      <label className="block">
        <span className="field-label">Why is {what} void?</span>
        <input
          className="field-input"
          value={reason}
          onChange={(e) => setReason(e.target.value)}
          placeholder="e.g. typed the wrong number"
          aria-invalid={error ? true : undefined}
          data-testid="void-own-reason"
          maxLength={RECORD_TEXT_LIMITS.voidReason}
        />
      </label>
      {error ? (
        <p className="field-error" role="alert">
          {error}
        </p>
      ) : null}
      <p className="text-base text-asphalt-800">
        It stays on file, struck through, with your reason.
      </p>
      <div className="flex flex-wrap gap-2">
        <button type="submit" className="btn-primary">
          Void it
        </button>
        <button type="button" className="btn-secondary" onClick={() => setOpen(false)}>
          Cancel
        </button>
      </div>
    </form>
  );
}
