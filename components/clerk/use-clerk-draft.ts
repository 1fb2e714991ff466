"use client";
import { useRef, useState } from "react";
import type { RunGroup } from "@/lib/paddock/run-group-plan";
import type { ScheduleSettings } from "@/lib/paddock/schedule-settings";
import type { ClerkActionState } from "@/lib/run-sheet/clerk-action-state";
import type { ClerkView } from "@/lib/run-sheet/clerk-view";
import { type ClerkAction, formOf } from "./clerk-actions";

type Local = { revision: number; groups: RunGroup[]; settings: ScheduleSettings };

export type DraftState = {
  groups: RunGroup[];
  settings: ScheduleSettings;
  revision: number | null;
  /** A save is on its way, or waiting behind another. */
  saving: boolean;
  /** The last answer of a save: "saved" or the server's refusal in its own words. */
  last: ClerkActionState;
  change: (groups: RunGroup[]) => void;
  changeSettings: (settings: ScheduleSettings) => void;
  /** Before building: drop a settings save still waiting to start (the build saves the settings
   *  itself), wait for saves under way, and answer the revision the server has now. */
  settle: () => Promise<number | null>;
  /** Drop local changes and show the draft as the server has it. */
  reload: () => void;
};

const noAnswer: ClerkActionState = {
  status: "error",
  message: "The draft was not saved: no answer from the server. Check the signal and try again.",
};

/**
 * The clerk's working copy of the draft: shown at once after a move, saved in order (one save at
 * a time, each with the revision the last one answered), so the server refuses a save only when
 * another desk saved in between. A newer revision from the server replaces the working copy.
 */
export function useClerkDraft({
  view,
  save,
  onSaved,
}: {
  view: ClerkView;
  save: ClerkAction;
  onSaved: () => void;
}): DraftState {
  const [local, setLocal] = useState<Local | null>(null);
  const [saving, setSaving] = useState(false);
  const [last, setLast] = useState<ClerkActionState>({ status: "idle" });
  const queue = useRef<Promise<void>>(Promise.resolve());
  const latest = useRef<Local | null>(null);
  const sent = useRef<Local | null>(null);
  const inFlight = useRef(0);
  const settingsTimer = useRef<ReturnType<typeof setTimeout> | null>(null);

  const server: Local | null = view.draft
    ? { revision: view.draft.revision, groups: view.draft.groups, settings: view.draft.settings }
    : null;
  const current = local && (!server || local.revision >= server.revision) ? local : server;

  const keep = (next: Local) => {
    latest.current = next;
    setLocal(next);
  };

  const saveLatest = () => {
    inFlight.current += 1;
    setSaving(true);
    queue.current = queue.current
      .then(async () => {
        const draft = latest.current;
        if (!draft || draft === sent.current || draft.revision < 0) return;
        sent.current = draft;
        const answer = await save(
          { status: "idle" },
          formOf({
            eventId: view.event.id,
            groups: JSON.stringify(draft.groups),
            settings: JSON.stringify(draft.settings),
            revision: String(draft.revision),
          }),
        ).catch(() => noAnswer);
        setLast(answer);
        if (answer.status !== "saved") return;
        // Later changes build on what was just saved: they carry its revision.
        const now = latest.current ?? draft;
        const saved = { ...now, revision: answer.revision };
        if (latest.current === draft) sent.current = saved;
        keep(saved);
        onSaved();
      })
      .finally(() => {
        inFlight.current -= 1;
        if (inFlight.current === 0) setSaving(false);
      });
  };

  return {
    groups: current?.groups ?? [],
    settings: current?.settings ?? view.defaultSettings,
    revision: current?.revision ?? null,
    saving,
    last,
    change: (groups) => {
      if (!current) return;
      keep({ ...current, groups });
      saveLatest();
    },
    changeSettings: (settings) => {
      keep({ revision: current?.revision ?? -1, groups: current?.groups ?? [], settings });
      if (settingsTimer.current) clearTimeout(settingsTimer.current);
      if (!current) return;
      // Saving from the first keystroke: publishing waits until the settings typed are saved.
      setSaving(true);
      settingsTimer.current = setTimeout(saveLatest, 800);
    },
    settle: async () => {
      if (settingsTimer.current) clearTimeout(settingsTimer.current);
      settingsTimer.current = null;
      await queue.current;
      if (inFlight.current === 0) setSaving(false);
      const revision = latest.current?.revision ?? current?.revision ?? null;
      return revision === null || revision < 0 ? null : revision;
    },
    reload: () => {
      latest.current = null;
      sent.current = null;
      setLocal(null);
      setLast({ status: "idle" });
      onSaved();
    },
  };
}
