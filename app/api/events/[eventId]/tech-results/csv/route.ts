import { getEventSummary } from "@/db/queries/get-event-summary";
import { AppError } from "@/lib/errors";
import { defineRoute } from "@/lib/http/define-route";
import { eventParams, pathEvent } from "@/lib/http/route-params";
import { csvDownload } from "@/lib/results/csv-download";
import { exportFileStem } from "@/lib/results/export-file-stem";
import { loadResultsStanding } from "@/lib/results/load-results-standing";
import { loadTechResults } from "@/lib/results/load-tech-results";
import { techResultsCsv } from "@/lib/results/tech-results-csv";

// GET /api/events/[eventId]/tech-results/csv — the provisional tech results as a CSV file: every
// car with its class, state and why, for the event's officials.
export const GET = defineRoute({
  params: eventParams,
  access: { permission: "entries.read", eventId: pathEvent },
  handler: async (_request, { params }) => {
    const event = await getEventSummary({ eventId: params.eventId });
    if (!event) throw new AppError("not_found", "No such event.");
    const { results, timeZone } = await loadTechResults({ eventId: params.eventId });
    const standing = await loadResultsStanding({
      eventId: params.eventId,
      issuedAt: results.issuedAt,
      timeZone,
    });
    return csvDownload(
      techResultsCsv(results, timeZone, standing.words.replace(" — ", ", ")),
      exportFileStem({
        what: "tech-results",
        eventSlug: event.slug,
        issuedAt: results.issuedAt,
        timeZone,
      }),
    );
  },
});
