"use client";
import { useState } from "react";
import type { FieldErrors } from "@/lib/errors";
import type { ScheduleSettings } from "@/lib/paddock/schedule-settings";
import { SettingsField } from "./settings-field";
import { settingsFromForm } from "./settings-from-form";

/**
 * How the day runs: start and end, session length, gap, lunch, rounds ("as many as fit" or a
 * number) and the drivers' briefing, all in the venue's local time. Every valid change goes to
 * `onSettings` (the schedule preview follows); "Build run groups" builds from the ready cars.
 */
export function ScheduleSettingsForm({
  settings,
  capText,
  readyDrives,
  pending,
  onSettings,
  onBuild,
}: {
  settings: ScheduleSettings;
  capText: string;
  readyDrives: number;
  pending: boolean;
  onSettings: (settings: ScheduleSettings) => void;
  onBuild: (settings: ScheduleSettings) => void;
}) {
  const [fields, setFields] = useState<FieldErrors>({});
  const [hasLunch, setHasLunch] = useState(settings.lunch !== null);
  const [hasBriefing, setHasBriefing] = useState(settings.briefing !== null);
  const [fit, setFit] = useState(settings.rounds === "fit");
  const read = (form: HTMLFormElement) => {
    const result = settingsFromForm(new FormData(form));
    setFields(result.ok ? {} : result.fields);
    return result.ok ? result.settings : null;
  };
  return (
    <form
      className="card space-y-4"
      aria-labelledby="settings-heading"
      data-testid="schedule-settings"
      onChange={(event) => {
        const next = read(event.currentTarget);
        if (next) onSettings(next);
      }}
      onSubmit={(event) => {
        event.preventDefault();
        const next = read(event.currentTarget);
        if (next) onBuild(next);
      }}
    >
      <h2 id="settings-heading" className="text-2xl font-bold">
        The day
      </h2>
      <p className="text-base">Times are the venue&apos;s local time. Cap: {capText}.</p>
      <div className="grid grid-cols-2 gap-3 lg:grid-cols-4">
        <SettingsField
          name="dayStart"
          label="Day starts"
          type="time"
          defaultValue={settings.dayStart}
          fields={fields}
        />
        <SettingsField
          name="dayEnd"
          label="Day ends"
          type="time"
          defaultValue={settings.dayEnd}
          fields={fields}
        />
        <SettingsField
          name="sessionMinutes"
          label="Session (min)"
          type="number"
          defaultValue={settings.sessionMinutes}
          fields={fields}
        />
        <SettingsField
          name="gapMinutes"
          label="Gap between (min)"
          type="number"
          defaultValue={settings.gapMinutes}
          fields={fields}
        />
      </div>
      <fieldset className="space-y-2">
        <legend className="field-label">Rounds</legend>
        <div className="flex flex-wrap items-end gap-3">
          <label className="flex min-h-touch items-center gap-2 text-base font-semibold">
            <input
              type="radio"
              name="roundsMode"
              value="fit"
              defaultChecked={fit}
              onChange={() => setFit(true)}
              className="size-6"
            />
            As many as fit
          </label>
          <label className="flex min-h-touch items-center gap-2 text-base font-semibold">
            <input
              type="radio"
              name="roundsMode"
              value="number"
              defaultChecked={!fit}
              onChange={() => setFit(false)}
              className="size-6"
            />
            A number:
          </label>
          <div className="w-28">
            <SettingsField
              name="rounds"
              label="Rounds"
              type="number"
              defaultValue={settings.rounds === "fit" ? 3 : settings.rounds}
              fields={fields}
              disabled={fit}
            />
          </div>
        </div>
      </fieldset>
      <div className="grid gap-3 md:grid-cols-2">
        <fieldset className="space-y-2">
          <label className="flex min-h-touch items-center gap-2 text-base font-semibold">
            <input
              type="checkbox"
              name="hasBriefing"
              value="yes"
              defaultChecked={hasBriefing}
              onChange={(e) => setHasBriefing(e.target.checked)}
              className="size-6"
            />
            Drivers&apos; briefing
          </label>
          <div className="grid grid-cols-2 gap-3">
            <SettingsField
              name="briefingStart"
              label="Starts"
              type="time"
              defaultValue={settings.briefing?.start ?? "08:00"}
              fields={fields}
              disabled={!hasBriefing}
            />
            <SettingsField
              name="briefingMinutes"
              label="Minutes"
              type="number"
              defaultValue={settings.briefing?.minutes ?? 30}
              fields={fields}
              disabled={!hasBriefing}
            />
          </div>
        </fieldset>
        <fieldset className="space-y-2">
          <label className="flex min-h-touch items-center gap-2 text-base font-semibold">
            <input
              type="checkbox"
              name="hasLunch"
              value="yes"
              defaultChecked={hasLunch}
              onChange={(e) => setHasLunch(e.target.checked)}
              className="size-6"
            />
            Lunch break
          </label>
          <div className="grid grid-cols-2 gap-3">
            <SettingsField
              name="lunchStart"
              label="Starts"
              type="time"
              defaultValue={settings.lunch?.start ?? "12:30"}
              fields={fields}
              disabled={!hasLunch}
            />
            <SettingsField
              name="lunchMinutes"
              label="Minutes"
              type="number"
              defaultValue={settings.lunch?.minutes ?? 45}
              fields={fields}
              disabled={!hasLunch}
            />
          </div>
        </fieldset>
      </div>
      <div className="flex flex-wrap items-center gap-3">
        <button type="submit" className="btn-primary" disabled={pending || readyDrives === 0}>
          {pending ? "Building…" : "Build run groups"}
        </button>
        <span className="text-base">
          From the <span className="tabular">{readyDrives}</span> drives of the ready cars (a shared
          car counts twice). Building again replaces the draft, not the published run sheet.
        </span>
      </div>
    </form>
  );
}
