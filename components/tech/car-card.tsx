"use client";
import { useMemo } from "react";
import { Caution } from "@/components/caution";
import { VerdictBadge } from "@/components/verdict-badge";
import { mergeEntryRecords } from "@/lib/offline/merge-entry-records";
import { previewVerdict } from "@/lib/offline/preview-verdict";
import { CarFilesPanel } from "./car-files-panel";
import { ChecklistPanel } from "./checklist-panel";
import { ChiefDecisionNote } from "./chief-decision-note";
import { ChiefPanel } from "./chief-panel";
import { EnvelopePanel } from "./envelope-panel";
import { PhotosNotesPanel } from "./photos-notes-panel";
import { ReadingsPanel } from "./readings-panel";
import { useTech } from "./tech-context";
import { VerdictView } from "./verdict-view";

/** The per-car screen at the tech line: who and what, the verdict, and everything to record. */
export function CarCard({ entryId, onBack }: { entryId: string; onBack: () => void }) {
  const { pack, ruleSet, local, canChief } = useTech();
  const entry = pack.entries.find((e) => e.entryId === entryId);
  const records = useMemo(
    () => mergeEntryRecords(entryId, pack.records, local),
    [entryId, pack.records, local],
  );
  const preview = useMemo(
    () =>
      entry
        ? previewVerdict({
            ruleSet,
            entry,
            records,
            eventDate: pack.event.eventDate,
            unitSystem: pack.event.unitSystem,
          })
        : null,
    [entry, ruleSet, records, pack.event.eventDate, pack.event.unitSystem],
  );
  const server = pack.verdicts.find((v) => v.entryId === entryId);
  if (!entry) {
    return (
      <div className="card space-y-3">
        <p>This car is not in the event pack.</p>
        <button type="button" className="btn-secondary" onClick={onBack}>
          Back to the tech line
        </button>
      </div>
    );
  }
  const className = (id: string | null) =>
    ruleSet.classes.find((c) => c.id === id)?.name ?? id ?? "";
  return (
    <article className="space-y-6" data-testid="car-card" data-entry-id={entryId}>
      <button type="button" className="btn-secondary" onClick={onBack}>
        ← All cars
      </button>
      <header className="flex items-start gap-3">
        <span
          className="tabular rounded-lg bg-asphalt-950 px-3 py-2 text-4xl font-bold text-asphalt-50"
          data-testid="car-card-number"
        >
          {entry.carNumber}
        </span>
        <div>
          <h1 className="text-2xl font-bold">{entry.car}</h1>
          <p className="text-lg">
            {entry.colour} · {entry.drivers}
          </p>
          <p className="text-lg">
            Entered in <strong>{className(entry.declaredClassId)}</strong>
          </p>
        </div>
      </header>
      <Caution title="Before you measure">
        Engine off, car on the level pad, and nobody under a car that is not secured on stands. The
        noise test is the one reading taken with the engine running; it has its own caution.
      </Caution>
      <section className="card space-y-4" aria-label="Verdict">
        {server ? (
          <div className="space-y-1" data-testid="server-verdict" data-status={server.status}>
            <p className="text-base font-semibold uppercase tracking-wide text-asphalt-700">
              Server verdict (the one that counts)
            </p>
            <VerdictBadge
              status={server.status}
              toClass={server.status === "moved-up" ? className(server.classId) : null}
            />
            <p className="text-lg" data-testid="server-verdict-reason">
              {server.reason}
            </p>
            <ChiefDecisionNote
              override={server.override}
              rejectedOverride={server.rejectedOverride}
              testId="server-verdict"
            />
          </div>
        ) : (
          <p className="text-base" data-testid="server-verdict" data-status="none">
            No server verdict yet.
          </p>
        )}
        {preview ? (
          <VerdictView
            verdict={preview}
            ruleSet={ruleSet}
            label="Preview on this device"
            testId="preview-verdict"
          />
        ) : null}
        {preview ? (
          <ChiefDecisionNote
            override={preview.override}
            rejectedOverride={preview.rejectedOverride}
            testId="preview-verdict"
            unlessShownWith={server}
          />
        ) : null}
      </section>
      {preview ? <EnvelopePanel verdict={preview} /> : null}
      <ReadingsPanel entryId={entryId} records={records} verdict={preview} />
      <ChecklistPanel entryId={entryId} records={records} verdict={preview} />
      <PhotosNotesPanel entryId={entryId} records={records} />
      <CarFilesPanel eventId={pack.event.id} entryId={entryId} />
      {canChief ? <ChiefPanel entryId={entryId} records={records} verdict={preview} /> : null}
    </article>
  );
}
