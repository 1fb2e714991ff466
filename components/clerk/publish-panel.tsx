"use client";
import { useState } from "react";
import { changedEntryIds, type RunSheetDiff } from "@/lib/paddock/diff-run-sheets";
import { Caution } from "../caution";
import { StoppedIcon } from "../icons/state-icons";
import { RunSheetDiffList } from "./run-sheet-diff-list";

/**
 * Publishing: first the difference from the last published version (who moved, which times
 * changed), then a confirmation. Only ready cars and no blocking rule: the server checks again
 * and its words are shown as they come.
 */
export function PublishPanel({
  diff,
  nextVersion,
  timeZone,
  blockers,
  pending,
  canPublish,
  onPublish,
}: {
  diff: RunSheetDiff | null;
  nextVersion: number;
  timeZone: string;
  /** What stops publishing, in words (blocking rules, cars no longer ready, unsaved changes). */
  blockers: string[];
  pending: boolean;
  canPublish: boolean;
  onPublish: () => void;
}) {
  const [reviewing, setReviewing] = useState(false);
  const [confirmed, setConfirmed] = useState(false);
  return (
    <section
      className="card space-y-3"
      aria-labelledby="publish-heading"
      data-testid="publish-panel"
    >
      <h2 id="publish-heading" className="text-2xl font-bold">
        Publish the run sheet
      </h2>
      {blockers.length > 0 ? (
        <ul className="space-y-1" data-testid="publish-blockers">
          {blockers.map((text) => (
            <li key={text} className="flex items-start gap-2 text-base font-semibold text-stopped">
              <StoppedIcon className="mt-0.5 size-5 shrink-0" />
              {text}
            </li>
          ))}
        </ul>
      ) : null}
      {!reviewing ? (
        <button
          type="button"
          className="btn-primary"
          disabled={!canPublish || !diff}
          onClick={() => {
            setReviewing(true);
            setConfirmed(false);
          }}
        >
          Review changes and publish version {nextVersion}
        </button>
      ) : diff ? (
        <div className="space-y-3" data-testid="publish-confirm">
          <h3 className="text-xl font-bold">
            Version {nextVersion}:{" "}
            {nextVersion === 1 ? "the first run sheet" : `changes since version ${nextVersion - 1}`}
          </h3>
          <RunSheetDiffList diff={diff} timeZone={timeZone} firstVersion={nextVersion === 1} />
          <p className="text-base" data-testid="publish-mail-count">
            {mailWords(nextVersion === 1 ? diff.entryIds.length : changedEntryIds(diff).length)}
          </p>
          <Caution title="Before you publish">
            A published version cannot be changed; publishing again makes a new version and e-mails
            the entrants whose group or times change. The published run sheet governs: confirm the
            groups at the drivers&apos; briefing.
          </Caution>
          <label className="flex min-h-touch items-center gap-3 text-base font-semibold">
            <input
              type="checkbox"
              className="size-6"
              checked={confirmed}
              onChange={(e) => setConfirmed(e.target.checked)}
            />
            I have read the changes; the groups will be confirmed at the briefing.
          </label>
          <div className="flex flex-wrap gap-2">
            <button
              type="button"
              className="btn-primary"
              disabled={!confirmed || pending || !canPublish}
              onClick={() => {
                onPublish();
                setReviewing(false);
              }}
            >
              {pending ? "Publishing…" : `Publish version ${nextVersion}`}
            </button>
            <button type="button" className="btn-secondary" onClick={() => setReviewing(false)}>
              Not yet
            </button>
          </div>
        </div>
      ) : null}
    </section>
  );
}

function mailWords(count: number): string {
  if (count === 0) return "Nobody's group or times change: no entrant will be e-mailed.";
  return `${count} ${count === 1 ? "entrant" : "entrants"} will be e-mailed their group and times.`;
}
