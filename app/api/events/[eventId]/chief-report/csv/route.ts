import { getEventSummary } from "@/db/queries/get-event-summary";
import { AppError } from "@/lib/errors";
import { defineRoute } from "@/lib/http/define-route";
import { eventParams, pathEvent } from "@/lib/http/route-params";
import { chiefReportCsv } from "@/lib/results/chief-report-csv";
import { csvDownload } from "@/lib/results/csv-download";
import { exportFileStem } from "@/lib/results/export-file-stem";
import { loadChiefReport } from "@/lib/results/load-chief-report";
import { loadResultsStanding } from "@/lib/results/load-results-standing";

// GET /api/events/[eventId]/chief-report/csv — the chief scrutineer's report of every car
// examined, with each rejection, as a CSV file (the chief scrutineer and the clerk of course).
export const GET = defineRoute({
  params: eventParams,
  access: { permission: "tech-report.read", eventId: pathEvent },
  handler: async (_request, { params }) => {
    const event = await getEventSummary({ eventId: params.eventId });
    if (!event) throw new AppError("not_found", "No such event.");
    const { report, timeZone } = await loadChiefReport({ eventId: params.eventId });
    const standing = await loadResultsStanding({
      eventId: params.eventId,
      issuedAt: report.issuedAt,
      timeZone,
    });
    return csvDownload(
      chiefReportCsv(report, timeZone, standing.words.replace(" — ", ", ")),
      exportFileStem({
        what: "chief-report",
        eventSlug: event.slug,
        issuedAt: report.issuedAt,
        timeZone,
      }),
    );
  },
});
