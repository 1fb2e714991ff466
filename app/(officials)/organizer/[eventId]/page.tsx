import type { Metadata } from "next";
import Link from "next/link";
import { ClassTally } from "@/components/class-tally";
import { EventHeading } from "@/components/event-heading";
import { StatusCounts } from "@/components/status-counts";
import { getEventRuleSet } from "@/db/queries/get-event-rule-set";
import { listEventEntries } from "@/db/queries/list-event-entries";
import { listEventOfficials } from "@/db/queries/list-event-officials";
import { loadEventPage } from "@/lib/auth/load-event-page";
import { roleLabels } from "@/lib/auth/roles";
import { eventStatusLabels } from "@/lib/events/event-status-label";
import { formatMoney } from "@/lib/format-money";

export const metadata: Metadata = { title: "Organizer" };

export default async function OrganizerPage({ params }: { params: Promise<{ eventId: string }> }) {
  const { eventId } = await params;
  const { event } = await loadEventPage({
    eventId,
    permission: "event.manage",
    returnTo: `/organizer/${eventId}`,
  });
  const [entries, officials, rules] = await Promise.all([
    listEventEntries({ eventId }),
    listEventOfficials({ eventId }),
    getEventRuleSet({ eventId }),
  ]);
  const ladder = rules?.ruleSet.classes.map((c) => c.name) ?? [];
  const facts: [string, string][] = [
    ["Club", event.clubName],
    ["Venue", `${event.venueName} (${(event.trackLengthM / 1000).toFixed(2)} km)`],
    ["Event status", eventStatusLabels[event.status]],
    ["Entries", `${entries.length} of ${event.capacity}`],
    ["Entry fee", formatMoney(event.entryFeeMinor, event.currency)],
    ["Units on the tech line", event.unitSystem === "mm" ? "millimetres" : "inches"],
    ["Time zone", event.timeZone],
    ["Rule set", `version ${event.ruleSetVersion} (pinned)`],
  ];
  return (
    <div className="space-y-6">
      <EventHeading roleLabel="Organizer" title="The event" event={event}>
        <div className="flex flex-wrap gap-2">
          <Link href={`/tech/${eventId}`} className="btn-secondary">
            Tech line
          </Link>
          <Link href={`/organizer/${eventId}/rules`} className="btn-secondary">
            Class rules
          </Link>
        </div>
      </EventHeading>
      <dl className="card grid gap-x-6 gap-y-2 sm:grid-cols-2" data-testid="event-facts">
        {facts.map(([label, value]) => (
          <div key={label}>
            <dt className="text-base font-semibold text-asphalt-700">{label}</dt>
            <dd className="text-lg">{value}</dd>
          </div>
        ))}
      </dl>
      <section className="space-y-2">
        <h2 className="text-2xl font-bold">Tech line so far</h2>
        <StatusCounts rows={entries} />
      </section>
      <section className="space-y-2">
        <h2 className="text-2xl font-bold">Entries by declared class, low to high</h2>
        <ClassTally
          classNames={entries.map((row) => row.declaredClassName)}
          ladder={ladder}
          testId="entries-by-class"
        />
      </section>
      <section className="space-y-2">
        <h2 className="text-2xl font-bold">Officials</h2>
        <ul className="card divide-y divide-asphalt-200">
          {officials.map((o) => (
            <li key={`${o.userId}-${o.role}`} className="flex justify-between gap-3 py-2">
              <span>{o.name}</span>
              <span className="font-semibold">{roleLabels[o.role]}</span>
            </li>
          ))}
        </ul>
      </section>
    </div>
  );
}
