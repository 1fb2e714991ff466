import "server-only";
import { getEntryForPass } from "../../db/queries/get-entry-for-pass";
import { getLatestRunSheet } from "../../db/queries/run-sheets/get-latest-run-sheet";
import { AppError } from "../errors";
import { entrySessions } from "./entry-sessions";
import { runSheetIcs } from "./run-sheet-ics";

/** The entry's sessions on the latest run sheet as an iCalendar file (the same file the e-mail
 *  carries). Not found when no run sheet puts the car in a group. */
export async function loadEntryCalendar({ entryId }: { entryId: string }) {
  const entry = await getEntryForPass({ entryId });
  if (!entry) throw new AppError("not_found", "No such entry.");
  const sheet = await getLatestRunSheet({ eventId: entry.eventId });
  if (!sheet || entrySessions(sheet.body, entryId).length === 0) {
    throw new AppError("not_found", "This car is not on a published run sheet yet.");
  }
  return {
    fileName: `car-${entry.carNumber}-sessions.ics`,
    ics: runSheetIcs({
      runSheet: sheet.body,
      entryId,
      eventName: entry.eventName,
      venueName: entry.venueName,
      version: sheet.version,
    }),
  };
}
