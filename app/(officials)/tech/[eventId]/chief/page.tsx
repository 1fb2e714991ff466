import type { Metadata } from "next";
import Link from "next/link";
import { Caution } from "@/components/caution";
import { EntryList } from "@/components/entry-list";
import { EventHeading } from "@/components/event-heading";
import { listEventEntries } from "@/db/queries/list-event-entries";
import { loadEventPage } from "@/lib/auth/load-event-page";
import { toEntryListRow } from "@/lib/entries/to-entry-list-row";

export const metadata: Metadata = { title: "Chief scrutineer" };

export default async function ChiefPage({ params }: { params: Promise<{ eventId: string }> }) {
  const { eventId } = await params;
  const { event } = await loadEventPage({
    eventId,
    permission: "verdicts.override",
    returnTo: `/tech/${eventId}/chief`,
  });
  const rows = (await listEventEntries({ eventId }))
    .filter((row) => row.needsChief || row.status === "re-measure" || row.status === "held")
    .map(toEntryListRow);
  return (
    <div>
      <EventHeading roleLabel="Chief scrutineer" title="Cars that need your decision" event={event}>
        <Link href={`/tech/${eventId}`} className="btn-secondary">
          Whole tech line
        </Link>
      </EventHeading>
      <div className="space-y-4">
        <Caution title="Your call">
          Readings that disagree, inconclusive measurements and held cars wait here. A void or
          override needs a written reason and is kept with your name.
        </Caution>
        <EntryList
          rows={rows}
          emptyText="Nothing waiting for you. Every car is either cleared or still in the queue."
        />
      </div>
    </div>
  );
}
