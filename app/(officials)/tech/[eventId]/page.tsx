import type { Metadata } from "next";
import Link from "next/link";
import { Caution } from "@/components/caution";
import { EntryList } from "@/components/entry-list";
import { EventHeading } from "@/components/event-heading";
import { StatusCounts } from "@/components/status-counts";
import { listEventEntries } from "@/db/queries/list-event-entries";
import { loadEventPage } from "@/lib/auth/load-event-page";
import { can } from "@/lib/auth/permissions";
import { toEntryListRow } from "@/lib/entries/to-entry-list-row";

export const metadata: Metadata = { title: "Tech line" };

export default async function TechLinePage({ params }: { params: Promise<{ eventId: string }> }) {
  const { eventId } = await params;
  const { event, roles } = await loadEventPage({
    eventId,
    permission: "tech.read",
    returnTo: `/tech/${eventId}`,
  });
  const rows = (await listEventEntries({ eventId })).map(toEntryListRow);
  return (
    <div>
      <EventHeading roleLabel="Tech line" title="Scrutineering" event={event}>
        {can(roles, "verdicts.override") ? (
          <Link href={`/tech/${eventId}/chief`} className="btn-secondary">
            Chief scrutineer&apos;s queue
          </Link>
        ) : null}
      </EventHeading>
      <div className="space-y-4">
        <Caution title="Before you measure">
          Engine off, car on the level pad, and nobody under a car that is not secured on stands.
        </Caution>
        <StatusCounts rows={rows} />
        <EntryList rows={rows} />
      </div>
    </div>
  );
}
