"use client";
import { type ChangeEvent, useActionState, useState } from "react";
import type { FieldErrors } from "@/lib/errors";
import type { RuleSetChangePreview } from "@/lib/rule-sets/preview-rule-set-change";
import {
  MAX_RULE_SET_CHARS,
  type RuleSetIssue,
} from "@/lib/scrutineer/rule-sets/parse-rule-set-json";
import { FieldError } from "../field-error";
import { ReEvaluationView } from "./re-evaluation-view";

export type RuleSetDraftState =
  | { status: "idle"; issues: RuleSetIssue[] }
  | { status: "error"; message: string; fields?: FieldErrors; issues: RuleSetIssue[] }
  | { status: "checked"; preview: RuleSetChangePreview; issues: RuleSetIssue[] };

/**
 * The organizer's editor for the next version of the event's rule set: paste or upload the JSON,
 * check it (every problem with its place, and the verdicts it would change), save it with a note.
 * Saving never changes the event; pinning the saved version does.
 */
export function RuleSetEditor({
  eventId,
  initialText,
  nextVersion,
  action,
}: {
  eventId: string;
  initialText: string;
  nextVersion: number;
  action: (state: RuleSetDraftState, formData: FormData) => Promise<RuleSetDraftState>;
}) {
  const [state, formAction, pending] = useActionState(action, { status: "idle", issues: [] });
  const [text, setText] = useState(initialText);
  const [notes, setNotes] = useState("");
  const [fileMessage, setFileMessage] = useState<string | null>(null);

  async function loadFile(event: ChangeEvent<HTMLInputElement>) {
    const file = event.target.files?.[0];
    if (!file) return;
    if (file.size > MAX_RULE_SET_CHARS * 4) {
      setFileMessage(`${file.name} is too large to be a rule set.`);
      return;
    }
    setText(await file.text());
    setFileMessage(`Loaded ${file.name}. Check it before saving.`);
  }

  const fields = state.status === "error" ? state.fields : undefined;
  return (
    <form action={formAction} className="card space-y-4" noValidate data-testid="rule-set-editor">
      <h2 className="text-2xl font-bold">Draft version {nextVersion}</h2>
      <p className="text-base text-asphalt-800">
        The box holds the latest saved version to edit; or upload a JSON file. Keep the rule
        set&apos;s <code>id</code>, set <code>version</code> to {nextVersion}, and keep every class
        an entry has declared. Saving stores the draft; the event is judged by it only once you pin
        it.
      </p>
      <input type="hidden" name="eventId" value={eventId} />
      <div>
        <label htmlFor="rule-set-file" className="field-label">
          Upload a JSON file (optional)
        </label>
        <input
          id="rule-set-file"
          type="file"
          accept="application/json,.json"
          className="mt-1 block min-h-touch w-full text-base file:mr-3 file:min-h-touch file:rounded-lg file:border-2 file:border-asphalt-800 file:bg-white file:px-4 file:font-semibold"
          onChange={loadFile}
        />
        {fileMessage ? (
          <p className="mt-1 text-base" role="status">
            {fileMessage}
          </p>
        ) : null}
      </div>
      <div>
        <label htmlFor="rule-set-text" className="field-label">
          Rule set (JSON)
        </label>
        <textarea
          id="rule-set-text"
          name="text"
          value={text}
          onChange={(e) => setText(e.target.value)}
          spellCheck={false}
          rows={18}
          className="mt-1 block w-full rounded-lg border-2 border-asphalt-600 bg-white p-3 font-mono text-base text-asphalt-950 aria-invalid:border-stopped"
          aria-invalid={state.issues.length > 0 ? true : undefined}
          aria-describedby="rule-set-issues"
        />
        <FieldError id="rule-set-text-error" messages={fields?.text} />
      </div>
      {state.issues.length > 0 ? (
        <div id="rule-set-issues" role="alert" className="space-y-1" data-testid="rule-set-issues">
          <p className="field-error">{state.status === "error" ? state.message : null}</p>
          <ul className="space-y-1 rounded-lg border-2 border-stopped-line bg-stopped-soft p-3">
            {state.issues.map((issue) => (
              <li key={`${issue.path}|${issue.message}`} className="text-base text-stopped">
                <strong className="font-semibold">{issue.where}</strong>
                {issue.path === "" ? (
                  ""
                ) : (
                  <code className="ml-1 break-all text-asphalt-800">({issue.path})</code>
                )}
                : {issue.message}
              </li>
            ))}
          </ul>
        </div>
      ) : null}
      <div>
        <label htmlFor="rule-set-notes" className="field-label">
          What changed and why (kept with the version)
        </label>
        <input
          id="rule-set-notes"
          name="notes"
          value={notes}
          onChange={(e) => setNotes(e.target.value)}
          maxLength={500}
          className="field-input"
          placeholder="Merlin wing height 100 → 120 mm, per the club's bulletin 3"
          aria-invalid={fields?.notes ? true : undefined}
          aria-describedby="rule-set-notes-error"
        />
        <FieldError id="rule-set-notes-error" messages={fields?.notes} />
      </div>
      {state.status === "error" && state.issues.length === 0 && !fields ? (
        <p className="field-error" role="alert">
          {state.message}
        </p>
      ) : null}
      {state.status === "checked" ? (
        <div className="space-y-2" role="status">
          <p className="font-semibold text-cleared">
            No problems found. Nothing is saved yet; here is what pinning it would change.
          </p>
          <ReEvaluationView preview={state.preview} />
        </div>
      ) : null}
      <div className="flex flex-wrap gap-3">
        <button
          type="submit"
          name="intent"
          value="check"
          className="btn-secondary"
          disabled={pending}
        >
          {pending ? "Checking…" : "Check"}
        </button>
        <button type="submit" name="intent" value="save" className="btn-primary" disabled={pending}>
          Save as version {nextVersion}
        </button>
      </div>
    </form>
  );
}
