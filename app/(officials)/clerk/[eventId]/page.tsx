import type { Metadata } from "next";
import { ClassTally } from "@/components/class-tally";
import { EntryList } from "@/components/entry-list";
import { EventHeading } from "@/components/event-heading";
import { listEventEntries } from "@/db/queries/list-event-entries";
import { loadEventPage } from "@/lib/auth/load-event-page";
import { toEntryListRow } from "@/lib/entries/to-entry-list-row";

export const metadata: Metadata = { title: "Clerk of course" };

export default async function ClerkPage({ params }: { params: Promise<{ eventId: string }> }) {
  const { eventId } = await params;
  const { event } = await loadEventPage({
    eventId,
    permission: "run-groups.write",
    returnTo: `/clerk/${eventId}`,
  });
  const all = await listEventEntries({ eventId });
  const cleared = all
    .filter((row) => row.status === "cleared" || row.status === "moved-up")
    .map(toEntryListRow);
  return (
    <div>
      <EventHeading roleLabel="Clerk of course" title="Cleared cars" event={event}>
        <p className="text-lg">
          <strong className="tabular">{cleared.length}</strong> of{" "}
          <span className="tabular">{all.length}</span> cars cleared to run. Only cleared cars can
          go into run groups.
        </p>
      </EventHeading>
      <div className="mb-4">
        <ClassTally
          classNames={cleared.map((row) => row.finalClass ?? row.declaredClass)}
          testId="cleared-by-class"
        />
      </div>
      <EntryList rows={cleared} emptyText="No car is cleared yet." />
    </div>
  );
}
