"use client";
import { useState } from "react";
import { formatWallClock } from "@/lib/paddock/format-wall-clock";
import type { LiveSession } from "@/lib/paddock/live-session";
import type { SessionCallState } from "@/lib/paddock/session-call";
import { sessionCallProblem } from "@/lib/paddock/session-call-problem";

export const sessionStateLabels: Record<LiveSession["state"], string> = {
  planned: "Planned",
  called: "Called",
  "on-track": "On track",
  "red-flag": "Red flag",
  finished: "Finished",
  "cut-short": "Cut short",
};

const marks: SessionCallState[] = ["called", "on-track", "red-flag", "finished", "cut-short"];
const needsNote = (state: SessionCallState) => state === "red-flag" || state === "cut-short";

/** One session to mark during the day: its planned and expected times, its state and the marks. */
export function SessionCallRow({
  session,
  groupName,
  timeZone,
  pending,
  onCall,
}: {
  session: LiveSession;
  groupName: string;
  timeZone: string;
  pending: boolean;
  onCall: (sessionKey: string, state: SessionCallState, note: string) => void;
}) {
  const [note, setNote] = useState("");
  const [noteMissing, setNoteMissing] = useState(false);
  const t = (iso: string) => formatWallClock(iso, timeZone);
  const noteId = `note-${session.key}`;
  return (
    <li className="card space-y-2" data-testid="session-call" data-session-key={session.key}>
      <div className="flex flex-wrap items-baseline justify-between gap-2">
        <h3 className="text-xl font-bold">
          {groupName} · round {session.round}
        </h3>
        <span className="text-lg font-semibold" data-testid="session-state">
          {sessionStateLabels[session.state]}
        </span>
      </div>
      <p className="tabular text-base">
        Planned {t(session.startsAt)}–{t(session.endsAt)}
        {session.shiftedMinutes !== 0 ? (
          <strong className="text-attention">
            {" "}
            · now {t(session.expectedStartsAt)}–{t(session.expectedEndsAt)} (
            {session.shiftedMinutes > 0 ? "+" : ""}
            {session.shiftedMinutes} min)
          </strong>
        ) : null}
      </p>
      {session.note ? <p className="text-base">Note: {session.note}</p> : null}
      <label className="field-label" htmlFor={noteId}>
        Note (needed for a red flag or a session cut short)
      </label>
      <input
        id={noteId}
        className="field-input"
        value={note}
        maxLength={500}
        onChange={(e) => {
          setNote(e.target.value);
          setNoteMissing(false);
        }}
        aria-invalid={noteMissing || undefined}
      />
      {noteMissing ? (
        <p className="field-error" role="alert">
          Say why: a red flag or a cut-short session needs a note.
        </p>
      ) : null}
      <div className="flex flex-wrap gap-2">
        {marks.map((state) => (
          <button
            key={state}
            type="button"
            className={
              state === "red-flag"
                ? "btn border-2 border-stopped bg-stopped-soft text-stopped"
                : "btn-secondary"
            }
            disabled={
              pending ||
              sessionCallProblem({
                current: session.state,
                next: state,
              }) !== null
            }
            onClick={() => {
              if (needsNote(state) && note.trim() === "") {
                setNoteMissing(true);
                return;
              }
              onCall(session.key, state, note.trim());
              setNote("");
            }}
          >
            {sessionStateLabels[state]}
          </button>
        ))}
      </div>
    </li>
  );
}
