import { getEventSummary } from "@/db/queries/get-event-summary";
import { getLatestRunSheet } from "@/db/queries/run-sheets/get-latest-run-sheet";
import { AppError } from "@/lib/errors";
import { defineRoute } from "@/lib/http/define-route";
import { eventParams, pathEvent } from "@/lib/http/route-params";
import { csvDownload } from "@/lib/results/csv-download";
import { exportFileStem } from "@/lib/results/export-file-stem";
import { runSheetCsv } from "@/lib/run-sheet/run-sheet-csv";

// GET /api/events/[eventId]/run-sheet/csv — the latest published run sheet as a CSV file (one
// line per drive, each round's start in the venue's time with its offset), for the officials.
export const GET = defineRoute({
  params: eventParams,
  access: { permission: "entries.read", eventId: pathEvent },
  handler: async (_request, { params }) => {
    const [event, publication] = await Promise.all([
      getEventSummary({ eventId: params.eventId }),
      getLatestRunSheet({ eventId: params.eventId }),
    ]);
    if (!event) throw new AppError("not_found", "No such event.");
    if (!publication) throw new AppError("not_found", "No run sheet has been published yet.");
    return csvDownload(
      // The byte order mark, as on the other exports: a spreadsheet then reads names as UTF-8.
      `\uFEFF${runSheetCsv(publication.body)}`,
      exportFileStem({
        what: `run-sheet-v${publication.version}`,
        eventSlug: event.slug,
        issuedAt: publication.publishedAt,
        timeZone: event.timeZone,
      }),
    );
  },
});
