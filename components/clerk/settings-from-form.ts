import type { FieldErrors } from "@/lib/errors";
import {
  checkedScheduleSettingsSchema,
  type ScheduleSettings,
} from "@/lib/paddock/schedule-settings";

export type SettingsRead =
  | { ok: true; settings: ScheduleSettings }
  | { ok: false; fields: FieldErrors };

const whole = (value: FormDataEntryValue | null) =>
  value === null || value === "" ? Number.NaN : Number(value);

/** The schedule settings form read into ScheduleSettings, or the field messages to show. */
export function settingsFromForm(form: FormData): SettingsRead {
  const text = (name: string) => String(form.get(name) ?? "");
  const candidate = {
    dayStart: text("dayStart"),
    dayEnd: text("dayEnd"),
    sessionMinutes: whole(form.get("sessionMinutes")),
    gapMinutes: whole(form.get("gapMinutes")),
    lunch:
      form.get("hasLunch") === "yes"
        ? { start: text("lunchStart"), minutes: whole(form.get("lunchMinutes")) }
        : null,
    rounds: form.get("roundsMode") === "fit" ? "fit" : whole(form.get("rounds")),
    briefing:
      form.get("hasBriefing") === "yes"
        ? { start: text("briefingStart"), minutes: whole(form.get("briefingMinutes")) }
        : null,
  };
  const parsed = checkedScheduleSettingsSchema.safeParse(candidate);
  if (parsed.success) return { ok: true, settings: parsed.data };
  const fields: FieldErrors = {};
  for (const issue of parsed.error.issues) {
    const path = issue.path.map(String);
    const name = fieldName(path);
    const message = issue.code === "invalid_type" ? "Enter a whole number." : issue.message;
    fields[name] = [...(fields[name] ?? []), message];
  }
  return { ok: false, fields };
}

/** "lunch.start" → "lunchStart", as the form's inputs are named. */
function fieldName(path: string[]): string {
  const [first = "form", second] = path;
  if (first === "rounds") return "rounds";
  return second ? `${first}${second[0]?.toUpperCase()}${second.slice(1)}` : first;
}
