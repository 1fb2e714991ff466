"use client";
import { useQuery, useQueryClient } from "@tanstack/react-query";
import { useMemo, useState } from "react";
import { applySessionCalls } from "@/lib/paddock/apply-session-calls";
import { clerkViewQuery, runGroupKeys } from "@/lib/query/run-group-queries";
import type { ClerkActionState } from "@/lib/run-sheet/clerk-action-state";
import type { ClerkView } from "@/lib/run-sheet/clerk-view";
import { Caution } from "../caution";
import { ActionMessage } from "./action-message";
import { AtAGlance } from "./at-a-glance";
import { carStateWhy } from "./car-state-why";
import { type ClerkAction, type ClerkActions, formOf } from "./clerk-actions";
import { ExportLinks } from "./export-links";
import { FlaggedList } from "./flagged-list";
import { JumpLinks } from "./jump-links";
import { previewRunSheet } from "./preview-run-sheet";
import { publishBlockers } from "./publish-blockers";
import { PublishPanel } from "./publish-panel";
import { PublishResult } from "./publish-result";
import { ReinspectionForm } from "./reinspection-form";
import { RunGroupsEditor } from "./run-groups-editor";
import { ScheduleSettingsForm } from "./schedule-settings-form";
import { SessionCallsPanel } from "./session-calls-panel";
import { useClerkDraft } from "./use-clerk-draft";
import { useServerNow } from "./use-server-now";
import { VersionList } from "./version-list";

type Busy = "build" | "publish" | "call" | "reinspect" | null;

/** The clerk of course's page: cars at a glance, the day, the run groups, publishing, the day's
 *  session marks and the exports. Data from ClerkView (hydrated, then refetched). */
export function ClerkDesk({ eventId, actions }: { eventId: string; actions: ClerkActions }) {
  const queryClient = useQueryClient();
  const { data: view } = useQuery(clerkViewQuery(eventId));
  if (!view) return <p className="text-lg">Loading the clerk of course&apos;s view…</p>;
  const refresh = () =>
    queryClient.invalidateQueries({ queryKey: runGroupKeys.clerkView(eventId) });
  return <ClerkDeskView view={view} actions={actions} refresh={refresh} />;
}

export function ClerkDeskView({
  view,
  actions,
  refresh,
}: {
  view: ClerkView;
  actions: ClerkActions;
  refresh: () => void;
}) {
  const [busy, setBusy] = useState<Busy>(null);
  const [answers, setAnswers] = useState<Partial<Record<Exclude<Busy, null>, ClerkActionState>>>(
    {},
  );
  const draft = useClerkDraft({ view, save: actions.save, onSaved: refresh });
  const now = useServerNow(view.now);
  const tz = view.event.timeZone;
  const capCars = view.draft?.capCars ?? view.cap.cars;
  const preview = useMemo(
    () => previewRunSheet({ view, groups: draft.groups, settings: draft.settings, capCars }),
    [view, draft.groups, draft.settings, capCars],
  );
  const flagged = useMemo(
    () => new Map(view.flagged.map((f) => [f.driveId, f.why])),
    [view.flagged],
  );
  const notReady = useMemo(() => {
    const cars = new Map(view.cars.map((c) => [c.entryId, c]));
    const ready = new Set(view.drives.map((d) => d.driveId));
    const out = new Map<string, { carNumber: number; why: string }>();
    for (const id of draft.groups.flatMap((g) => g.driveIds)) {
      if (ready.has(id)) continue;
      const car = cars.get(id.split(":")[0] ?? "");
      if (car)
        out.set(id, { carNumber: car.carNumber, why: carStateWhy(car) ?? "Not ready to run." });
    }
    return out;
  }, [view.cars, view.drives, draft.groups]);
  const live = useMemo(
    () =>
      view.published
        ? applySessionCalls({ sessions: view.published.body.sessions, calls: view.calls, now })
        : [],
    [view.published, view.calls, now],
  );

  const run = async (
    kind: Exclude<Busy, null>,
    action: ClerkAction,
    fields: Record<string, string>,
  ) => {
    setBusy(kind);
    const answer = await action(
      { status: "idle" },
      formOf({ eventId: view.event.id, ...fields }),
    ).catch(
      (): ClerkActionState => ({
        status: "error",
        message: "No answer from the server. Check the signal and try again.",
      }),
    );
    setAnswers((a) => ({ ...a, [kind]: answer }));
    setBusy(null);
    refresh();
  };
  const revision = draft.revision === null || draft.revision < 0 ? "" : String(draft.revision);
  const stale = draft.last.status === "error";
  const blockers = publishBlockers({
    view,
    groups: draft.groups,
    notes: preview.notes,
    saving: draft.saving,
    saveFailed: stale,
  });

  return (
    <div className="space-y-6 pb-24">
      <JumpLinks published={view.published !== null} />
      <FlaggedList flagged={view.flagged} />
      {view.published ? (
        <SessionCallsPanel
          live={live}
          now={now}
          groupNames={view.published.body.groups.map((g) => g.name)}
          timeZone={tz}
          pending={busy === "call"}
          onCall={(sessionKey, state, note) =>
            run("call", actions.callSession, { sessionKey, state, note })
          }
        />
      ) : null}
      {answers.call ? <ActionMessage state={answers.call} testId="call-message" /> : null}
      <AtAGlance cars={view.cars} />
      <ScheduleSettingsForm
        settings={draft.settings}
        capText={`${view.cap.cars} cars per group (${view.cap.source})`}
        readyDrives={view.drives.length}
        pending={busy === "build"}
        onSettings={draft.changeSettings}
        onBuild={async (settings) => {
          const settled = await draft.settle();
          await run("build", actions.build, {
            settings: JSON.stringify(settings),
            revision: settled === null ? "" : String(settled),
          });
        }}
      />
      {answers.build ? <ActionMessage state={answers.build} testId="build-message" /> : null}
      <section className="space-y-3" aria-labelledby="groups-heading">
        <h2 id="groups-heading" className="text-2xl font-bold">
          Run groups {draft.groups.length > 0 ? `(${draft.groups.length})` : ""}
        </h2>
        {draft.groups.length === 0 ? (
          <p className="text-base">No draft yet: set the day above and build run groups.</p>
        ) : (
          <>
            <p className="text-base" data-testid="draft-status">
              {draft.saving
                ? "Saving the draft…"
                : `Draft saved (revision ${draft.revision}). Drivers see only a published run sheet.`}
            </p>
            <ActionMessage
              state={draft.last.status === "error" ? draft.last : { status: "idle" }}
              testId="save-message"
            />
            {stale ? (
              <button type="button" className="btn-secondary" onClick={draft.reload}>
                Reload the groups as saved
              </button>
            ) : null}
            {preview.scheduleWarnings.map((w) => (
              <Caution key={w} title="Schedule">
                {w}
              </Caution>
            ))}
            <RunGroupsEditor
              groups={draft.groups}
              drives={view.drives}
              capCars={capCars}
              timeZone={tz}
              sessionsByGroup={preview.sessionsByGroup}
              explanations={preview.explanations}
              notes={preview.notes}
              flagged={flagged}
              notReady={notReady}
              onChange={draft.change}
              carControls={(drive) => (
                <ReinspectionForm
                  key={drive.entryId}
                  entryId={drive.entryId}
                  carNumber={drive.carNumber}
                  pending={busy === "reinspect"}
                  fields={
                    answers.reinspect?.status === "error" ? answers.reinspect.fields : undefined
                  }
                  onAsk={(form) => run("reinspect", actions.askReinspection, form)}
                />
              )}
            />
            {answers.reinspect ? (
              <ActionMessage state={answers.reinspect} testId="reinspect-message" />
            ) : null}
          </>
        )}
      </section>
      <PublishPanel
        diff={preview.diff}
        nextVersion={(view.versions.reduce((m, v) => Math.max(m, v.version), 0) || 0) + 1}
        timeZone={tz}
        blockers={blockers}
        pending={busy === "publish"}
        canPublish={blockers.length === 0 && revision !== ""}
        onPublish={() => run("publish", actions.publish, { revision })}
      />
      {answers.publish ? <PublishResult state={answers.publish} timeZone={tz} /> : null}
      <VersionList versions={view.versions} timeZone={tz} />
      <ExportLinks eventId={view.event.id} published={view.published !== null} />
      <Caution title="The run sheet governs">
        The published run sheet is what counts: confirm the groups at the drivers&apos; briefing.
        The chief scrutineer has the final say on whether a car may run; the sanctioning body&apos;s
        rulebook governs.
      </Caution>
    </div>
  );
}
