import "server-only";
import { saveRunGroupDraft } from "../../db/queries/run-sheets/save-run-group-draft";
import { AppError } from "../errors";
import { buildRunGroups } from "../paddock/build-run-groups";
import type { ScheduleSettings } from "../paddock/schedule-settings";
import { eventCap } from "./load-clerk-view";
import { loadEventCars } from "./load-event-cars";

/** Build run groups from the cars ready to run now and save them as the clerk's draft. */
export async function buildDraft({
  eventId,
  settings,
  revision,
  builtBy,
  now,
}: {
  eventId: string;
  settings: ScheduleSettings;
  revision: number | null;
  builtBy: string;
  now: Date;
}): Promise<{ revision: number; message: string }> {
  const { summary, drives } = await loadEventCars({ eventId });
  if (drives.length === 0) {
    throw new AppError("conflict", "No car is ready to run yet: nothing to put in run groups.");
  }
  const cap = eventCap(summary);
  const plan = buildRunGroups({ drives, capCars: cap.cars });
  const saved = await saveRunGroupDraft({
    eventId,
    groups: plan.groups,
    settings,
    capCars: cap.cars,
    revision,
    updatedBy: builtBy,
    now,
  });
  const gave = plan.gaveWay.length;
  return {
    revision: saved,
    message: `${plan.groups.length} run groups built for ${drives.length} drives (${cap.cars} cars per group at most). ${plan.groupCountReason}${gave > 0 ? ` ${gave} rule${gave === 1 ? "" : "s"} had to give way: see the warnings.` : ""} Not published yet.`,
  };
}
