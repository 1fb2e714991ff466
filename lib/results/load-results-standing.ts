import "server-only";
import { getEventSummary } from "../../db/queries/get-event-summary";
import { listOpenReinspections } from "../../db/queries/reinspections/list-open-reinspections";
import { clock } from "../clock";
import { resultsStanding } from "./results-standing";

/** Whether the event's tech results (issued at `issuedAt`) are provisional or final, now. */
export async function loadResultsStanding({
  eventId,
  issuedAt,
  timeZone,
}: {
  eventId: string;
  issuedAt: string | null;
  timeZone: string;
}) {
  const [summary, open] = await Promise.all([
    getEventSummary({ eventId }),
    listOpenReinspections({ eventId }),
  ]);
  return resultsStanding({
    issuedAt,
    timeZone,
    protestWindowMinutes: summary?.protestWindowMinutes ?? 30,
    openReinspections: open.length,
    now: clock.now(),
  });
}
