"use client";
import { useState } from "react";
import { makeRecord } from "@/lib/offline/make-record";
import { dimensionLabel } from "@/lib/scrutineer/dimension-labels";
import type { TechRecord } from "@/lib/scrutineer/record-schema";
import type { Verdict } from "@/lib/scrutineer/verdict-schema";
import { formatReadingValue } from "./format-reading-value";
import { useTech } from "./tech-context";

/**
 * The chief scrutineer's decisions, each an immutable record with a written reason: void a
 * reading (it stays on file, struck through) or override the computed verdict.
 */
export function ChiefPanel({
  entryId,
  records,
  verdict,
}: {
  entryId: string;
  records: TechRecord[];
  verdict: Verdict | null;
}) {
  const { ruleSet, pack, official, deviceId, record } = useTech();
  const voided = new Set(
    records.flatMap((r) => (r.kind === "void" ? [r.payload.targetRecordId] : [])),
  );
  const voidable = records.filter(
    (r) => (r.kind === "reading" || r.kind === "checklist") && !voided.has(r.id),
  );
  const [target, setTarget] = useState("");
  const [voidReason, setVoidReason] = useState("");
  const [status, setStatus] = useState<"cleared" | "moved-up" | "held">("cleared");
  const [classId, setClassId] = useState(ruleSet.classes[0]?.id ?? "");
  const [reason, setReason] = useState("");
  const [message, setMessage] = useState<string | null>(null);

  const describeRecord = (r: TechRecord) =>
    r.kind === "reading"
      ? `${dimensionLabel(r.payload.dimension, "corner" in r.payload ? r.payload.corner : null)} ${formatReadingValue(r.payload.dimension, r.payload.value, pack.event.unitSystem)}`
      : r.kind === "checklist"
        ? `checklist ${r.payload.itemId}: ${r.payload.result}`
        : r.kind;

  const submitVoid = async () => {
    if (!target) return setMessage("Pick the record to void.");
    if (voidReason.trim().length < 3) return setMessage("Write why the record is void.");
    await record(
      makeRecord({
        kind: "void",
        payload: { targetRecordId: target, reason: voidReason.trim() },
        entryId,
        officialId: official.id,
        deviceId,
        now: new Date(),
      }),
    );
    setTarget("");
    setVoidReason("");
    setMessage("Void saved.");
  };
  const submitOverride = async () => {
    if (reason.trim().length < 5)
      return setMessage("Write the reason for the override (at least a few words).");
    await record(
      makeRecord({
        kind: "override",
        payload: { status, classId: status === "held" ? null : classId, reason: reason.trim() },
        entryId,
        officialId: official.id,
        deviceId,
        now: new Date(),
      }),
    );
    setReason("");
    setMessage("Override saved.");
  };

  return (
    <section
      className="space-y-4 rounded-xl border-4 border-attention-line bg-attention-soft p-4"
      aria-labelledby="chief-title"
      data-testid="chief-panel"
    >
      <h2 id="chief-title" className="text-2xl font-bold">
        Chief scrutineer
      </h2>
      {verdict?.flags.includes("disagreement") ? (
        <p className="font-semibold">
          Readings of this car disagree beyond their uncertainty. Void the reading you reject, or
          re-measure.
        </p>
      ) : null}
      <div className="space-y-2">
        <label className="block">
          <span className="field-label">Void a record</span>
          <select
            className="field-input"
            value={target}
            onChange={(e) => setTarget(e.target.value)}
            data-testid="void-target"
          >
            <option value="">Pick a reading or checklist answer</option>
            {voidable.map((r) => (
              <option key={r.id} value={r.id}>
                {describeRecord(r)} —{" "}
                {pack.officials.find((o) => o.userId === r.officialId)?.name ?? "official"}
              </option>
            ))}
          </select>
        </label>
        <input
          className="field-input"
          placeholder="Why it is void"
          value={voidReason}
          onChange={(e) => setVoidReason(e.target.value)}
          data-testid="void-reason"
        />
        <button type="button" className="btn-secondary" onClick={() => void submitVoid()}>
          Void it
        </button>
      </div>
      <div className="space-y-2">
        <p className="field-label">Override the verdict</p>
        <div className="grid gap-2 sm:grid-cols-2">
          <select
            className="field-input"
            value={status}
            onChange={(e) => setStatus(e.target.value as typeof status)}
            aria-label="Decision"
          >
            <option value="cleared">Cleared</option>
            <option value="moved-up">Moved up</option>
            <option value="held">Held</option>
          </select>
          {status !== "held" ? (
            <select
              className="field-input"
              value={classId}
              onChange={(e) => setClassId(e.target.value)}
              aria-label="Class"
            >
              {ruleSet.classes.map((c) => (
                <option key={c.id} value={c.id}>
                  {c.name}
                </option>
              ))}
            </select>
          ) : null}
        </div>
        <textarea
          className="field-input min-h-20 py-2"
          placeholder="Reason (kept with your name)"
          value={reason}
          onChange={(e) => setReason(e.target.value)}
          data-testid="override-reason"
        />
        <button type="button" className="btn-primary" onClick={() => void submitOverride()}>
          Save override
        </button>
      </div>
      {message ? (
        <p role="status" className="font-semibold">
          {message}
        </p>
      ) : null}
    </section>
  );
}
