import type { Metadata } from "next";
import { ChiefReportSheet } from "@/components/print/chief-report-sheet";
import { PrintSheet } from "@/components/print/print-sheet";
import { loadEventPage } from "@/lib/auth/load-event-page";
import { loadChiefReport } from "@/lib/results/load-chief-report";
import { loadResultsStanding } from "@/lib/results/load-results-standing";
import { RESULTS_NOTICE } from "@/lib/results/results-notice";

export const metadata: Metadata = { title: "Chief scrutineer's report (print)" };

// GET /tech/[eventId]/print/chief-report — the chief scrutineer's report to the clerk of course
// for A4: every car examined, its state, and the reason for each rejection.
export default async function ChiefReportPrintPage({
  params,
}: {
  params: Promise<{ eventId: string }>;
}) {
  const { eventId } = await params;
  const { event } = await loadEventPage({
    eventId,
    permission: "tech-report.read",
    returnTo: `/tech/${eventId}/print/chief-report`,
  });
  const { report, timeZone, unitSystem } = await loadChiefReport({ eventId });
  const standing = await loadResultsStanding({ eventId, issuedAt: report.issuedAt, timeZone });
  return (
    <PrintSheet
      roleLabel="Chief scrutineer's report to the clerk of course"
      title="Cars examined at the tech line"
      event={event}
      standing={standing.words}
      notice={RESULTS_NOTICE}
      units={unitSystem}
      csvHref={`/api/events/${eventId}/chief-report/csv`}
    >
      <ChiefReportSheet report={report} />
    </PrintSheet>
  );
}
