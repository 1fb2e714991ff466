"use client";
import { useState } from "react";
import { isPending, type LocalRecord } from "@/lib/offline/local-record";
import type { TechRecord } from "@/lib/scrutineer/records/record-schema";
import { describeOutboxRecord } from "./describe-outbox-record";

const stateWords: Record<LocalRecord["state"], string> = {
  queued: "Waiting to send",
  sending: "Sending",
  sent: "Sent",
  duplicate: "Sent (server already had it)",
  refused: "Refused",
  "needs-sign-in": "Held: sign in again",
};

/** The outbox as a bar with counts, and a list of every record's state on request. */
export function OutboxPanel({
  local,
  online,
  running,
  onSendNow,
  carNumberOf,
  unitSystem,
  itemLabel,
  className,
  findRecord,
}: {
  local: LocalRecord[];
  online: boolean;
  running: boolean;
  onSendNow: () => void;
  carNumberOf: (entryId: string) => number | undefined;
  unitSystem: "mm" | "in";
  itemLabel: (itemId: string) => string | undefined;
  className: (classId: string) => string | undefined;
  findRecord: (recordId: string) => TechRecord | undefined;
}) {
  const [open, setOpen] = useState(false);
  const total = local.length;
  const done = local.filter((r) => r.state === "sent" || r.state === "duplicate").length;
  const refused = local.filter((r) => r.state === "refused").length;
  const pending = local.filter(isPending).length;
  const held = local.filter((r) => r.state === "needs-sign-in").length;
  const percent = total === 0 ? 0 : Math.round((done / total) * 100);
  return (
    <section className="card space-y-2" aria-label="Outbox" data-testid="outbox">
      <div className="flex flex-wrap items-center justify-between gap-2">
        <p className="text-lg font-semibold" data-testid="outbox-summary">
          {total === 0 ? (
            "Outbox empty — everything is sent"
          ) : (
            <>
              {done} of {total} sent
              {pending > 0 ? ` · ${pending} waiting` : ""}
              {refused > 0 ? ` · ${refused} refused` : ""}
            </>
          )}
        </p>
        <div className="flex gap-2">
          {total > 0 ? (
            <button
              type="button"
              className="btn-secondary"
              onClick={onSendNow}
              disabled={running || pending === 0 || !online}
            >
              {running ? "Sending…" : "Send now"}
            </button>
          ) : null}
          {total > 0 ? (
            <button
              type="button"
              className="btn-secondary"
              onClick={() => setOpen((v) => !v)}
              aria-expanded={open}
            >
              {open ? "Hide list" : "Show list"}
            </button>
          ) : null}
        </div>
      </div>
      {total > 0 ? (
        <div
          className="h-4 overflow-hidden rounded-full border-2 border-asphalt-700 bg-asphalt-100"
          role="progressbar"
          aria-valuemin={0}
          aria-valuemax={total}
          aria-valuenow={done}
          aria-label={`${done} of ${total} records sent`}
        >
          <div className="h-full bg-accent transition-[width]" style={{ width: `${percent}%` }} />
        </div>
      ) : null}
      {!online ? (
        <p className="text-base font-semibold text-attention" data-testid="offline-note">
          No signal. Everything you record is kept on this phone and sent when there is signal.
        </p>
      ) : null}
      {held > 0 ? (
        <p className="text-base font-semibold text-stopped">
          {held} records are held until you sign in again. They are safe on this phone.{" "}
          <a
            className="underline"
            href={`/sign-in?callbackUrl=${encodeURIComponent(typeof location === "undefined" ? "/home" : location.pathname)}`}
          >
            Sign in
          </a>
        </p>
      ) : null}
      {open ? (
        <ul
          className="max-h-80 divide-y divide-asphalt-200 overflow-y-auto"
          data-testid="outbox-list"
        >
          {[...local].reverse().map((item) => (
            <li key={item.record.id} className="py-2 text-base" data-state={item.state}>
              <span className="font-semibold">
                {describeOutboxRecord({
                  record: item.record,
                  carNumber: carNumberOf(item.record.entryId),
                  unitSystem,
                  itemLabel,
                  className,
                  findRecord,
                })}
              </span>{" "}
              ·{" "}
              <span className={item.state === "refused" ? "font-semibold text-stopped" : ""}>
                {stateWords[item.state]}
              </span>
              {item.lastError && item.state !== "sent" ? (
                <span className="block text-asphalt-700">{item.lastError}</span>
              ) : null}
            </li>
          ))}
        </ul>
      ) : null}
    </section>
  );
}
