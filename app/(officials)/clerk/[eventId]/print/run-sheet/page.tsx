import type { Metadata } from "next";
import { FlaggedDrivesBlock } from "@/components/print/flagged-drives-block";
import { PrintSheet } from "@/components/print/print-sheet";
import { RunSheetSheet } from "@/components/print/run-sheet-sheet";
import { listEventOfficials } from "@/db/queries/list-event-officials";
import { getLatestRunSheet } from "@/db/queries/run-sheets/get-latest-run-sheet";
import { loadEventPage } from "@/lib/auth/load-event-page";
import { describeIssueTime } from "@/lib/results/describe-issue-time";
import { flagPublishedDrives } from "@/lib/run-sheet/flag-published-drives";
import { loadEventCars } from "@/lib/run-sheet/load-event-cars";
import { shapeRunSheetPrint } from "@/lib/run-sheet/shape-run-sheet-print";

export const metadata: Metadata = { title: "Run sheet (print)" };

const RUN_SHEET_NOTICE =
  "Times are planned: the clerk of course calls each group, and the run sheet is confirmed at the drivers' briefing. Motorsport is dangerous; the sanctioning body's rulebook governs.";

// GET /clerk/[eventId]/print/run-sheet — the latest published run sheet laid out for A4: one
// block per run group with its session times and its cars, numbers large.
export default async function RunSheetPrintPage({
  params,
}: {
  params: Promise<{ eventId: string }>;
}) {
  const { eventId } = await params;
  const { event } = await loadEventPage({
    eventId,
    permission: "entries.read",
    returnTo: `/clerk/${eventId}/print/run-sheet`,
  });
  const [publication, officials, { cars }] = await Promise.all([
    getLatestRunSheet({ eventId }),
    listEventOfficials({ eventId }),
    loadEventCars({ eventId }),
  ]);
  const flagged = publication ? flagPublishedDrives(publication.body, cars) : [];
  const sheet = publication ? shapeRunSheetPrint(publication) : null;
  const publisher = publication
    ? officials.find((o) => o.userId === publication.publishedBy)
    : undefined;
  return (
    <PrintSheet
      roleLabel="Run sheet"
      title="Run groups and session times"
      event={event}
      standing={
        sheet
          ? `Version ${sheet.version}, published ${describeIssueTime(sheet.publishedAt, event.timeZone)}${publisher ? ` by ${publisher.name ?? publisher.email}` : ""}`
          : "No run sheet has been published yet."
      }
      notice={RUN_SHEET_NOTICE}
      csvHref={`/api/events/${eventId}/run-sheet/csv`}
    >
      {sheet ? (
        <>
          <FlaggedDrivesBlock flagged={flagged} />
          <RunSheetSheet sheet={sheet} />
        </>
      ) : (
        <p className="text-lg">The clerk of course has not published a run sheet yet.</p>
      )}
    </PrintSheet>
  );
}
