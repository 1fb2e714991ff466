import "server-only";
import { getEventSummary } from "../../db/queries/get-event-summary";
import { getRunGroupDraft } from "../../db/queries/run-sheets/get-run-group-draft";
import { saveRunGroupDraft } from "../../db/queries/run-sheets/save-run-group-draft";
import { AppError } from "../errors";
import type { RunGroup } from "../paddock/run-group-plan";
import type { ScheduleSettings } from "../paddock/schedule-settings";
import { eventCap } from "./load-clerk-view";

/** Save the clerk's own change to the draft, keeping the draft's cap (the venue's before any). */
export async function saveDraftChange(args: {
  eventId: string;
  groups: RunGroup[];
  settings: ScheduleSettings;
  revision: number | null;
  updatedBy: string;
  now: Date;
}): Promise<number> {
  const names = args.groups.map((g) => g.name.trim().toLowerCase());
  if (new Set(names).size !== names.length) {
    throw new AppError("conflict", "Two groups have the same name; give each its own.");
  }
  const [current, summary] = await Promise.all([
    getRunGroupDraft({ eventId: args.eventId }),
    getEventSummary({ eventId: args.eventId }),
  ]);
  if (!summary) throw new AppError("not_found", "No such event.");
  return saveRunGroupDraft({
    ...args,
    capCars: current?.capCars ?? eventCap(summary).cars,
  });
}
