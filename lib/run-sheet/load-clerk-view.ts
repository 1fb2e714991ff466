import "server-only";
import { getLatestRunSheet } from "../../db/queries/run-sheets/get-latest-run-sheet";
import { getRunGroupDraft } from "../../db/queries/run-sheets/get-run-group-draft";
import { listRunSheetVersions } from "../../db/queries/run-sheets/list-run-sheet-versions";
import { listSessionCalls } from "../../db/queries/run-sheets/list-session-calls";
import { callsOnSheet } from "../paddock/calls-on-sheet";
import { groupCap } from "../paddock/group-cap";
import type { ClerkView } from "./clerk-view";
import { defaultScheduleSettings } from "./default-schedule-settings";
import { flagPublishedDrives } from "./flag-published-drives";
import { loadEventCars } from "./load-event-cars";

/** Everything the clerk of course's page shows, read in one go. */
export async function loadClerkView({
  eventId,
  now,
}: {
  eventId: string;
  now: Date;
}): Promise<ClerkView> {
  const [{ summary, cars, drives }, draft, published, versions, calls] = await Promise.all([
    loadEventCars({ eventId }),
    getRunGroupDraft({ eventId }),
    getLatestRunSheet({ eventId }),
    listRunSheetVersions({ eventId }),
    listSessionCalls({ eventId }),
  ]);
  return {
    event: {
      id: summary.id,
      name: summary.name,
      timeZone: summary.timeZone,
      eventDate: summary.eventDate,
    },
    cars,
    drives,
    cap: eventCap(summary),
    draft,
    defaultSettings: defaultScheduleSettings,
    published,
    versions,
    calls: published ? callsOnSheet(calls, published.body) : [],
    flagged: published ? flagPublishedDrives(published.body, cars) : [],
    now: now.toISOString(),
  };
}

/** Cars per group for the event's venue: the organizer's number, or the track's length × density. */
export function eventCap(summary: {
  maxCarsOnTrack: number | null;
  trackLengthM: number;
  carsPerKm: string | number | null;
}) {
  return groupCap({
    maxCarsOnTrack: summary.maxCarsOnTrack,
    trackLengthM: summary.trackLengthM,
    carsPerKm: summary.carsPerKm === null ? null : Number(summary.carsPerKm),
  });
}
