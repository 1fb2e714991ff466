import type { Metadata } from "next";
import { PrintSheet } from "@/components/print/print-sheet";
import { TechResultsSheet } from "@/components/print/tech-results-sheet";
import { loadEventPage } from "@/lib/auth/load-event-page";
import { loadResultsStanding } from "@/lib/results/load-results-standing";
import { loadTechResults } from "@/lib/results/load-tech-results";
import { RESULTS_NOTICE } from "@/lib/results/results-notice";

export const metadata: Metadata = { title: "Tech results (print)" };

// GET /tech/[eventId]/print/results — the provisional tech results laid out for A4: one block per
// class with the cars cleared in it or moved up into it (and why), then held and undecided cars.
export default async function TechResultsPrintPage({
  params,
}: {
  params: Promise<{ eventId: string }>;
}) {
  const { eventId } = await params;
  const { event } = await loadEventPage({
    eventId,
    permission: "entries.read",
    returnTo: `/tech/${eventId}/print/results`,
  });
  const { results, timeZone, unitSystem } = await loadTechResults({ eventId });
  const standing = await loadResultsStanding({ eventId, issuedAt: results.issuedAt, timeZone });
  return (
    <PrintSheet
      roleLabel="Tech results"
      title="Tech results by class"
      event={event}
      standing={standing.words}
      notice={RESULTS_NOTICE}
      units={unitSystem}
      csvHref={`/api/events/${eventId}/tech-results/csv`}
    >
      <TechResultsSheet results={results} />
    </PrintSheet>
  );
}
