import type { Metadata } from "next";
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
  const byClass = new Map<string, number>();
  for (const row of cleared) {
    const cls = row.finalClass ?? row.declaredClass; // display names (toEntryListRow)
    byClass.set(cls, (byClass.get(cls) ?? 0) + 1);
  }
  return (
    <div>
      <EventHeading roleLabel="Clerk of course" title="Cleared cars" event={event}>
        <p className="text-lg">
          <strong className="tabular">{cleared.length}</strong> of{" "}
          <span className="tabular">{all.length}</span> cars cleared to run. Only cleared cars can
          go into run groups.
        </p>
      </EventHeading>
      <ul className="mb-4 flex flex-wrap gap-2" data-testid="cleared-by-class">
        {[...byClass.entries()].map(([cls, count]) => (
          <li
            key={cls}
            className="rounded-full border-2 border-asphalt-700 px-3 py-1 font-semibold"
          >
            {cls}: <span className="tabular">{count}</span>
          </li>
        ))}
      </ul>
      <EntryList rows={cleared} emptyText="No car is cleared yet." />
    </div>
  );
}
