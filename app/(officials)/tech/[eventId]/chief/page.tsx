import type { Metadata } from "next";
import Link from "next/link";
import { Caution } from "@/components/caution";
import { EventHeading } from "@/components/event-heading";
import { ChiefQueue } from "@/components/tech/chief-queue";
import { ReinspectionCloseForm } from "@/components/tech/reinspection-close-form";
import { listEventEntryNumbers } from "@/db/queries/list-event-entry-numbers";
import { listOpenReinspections } from "@/db/queries/reinspections/list-open-reinspections";
import { loadEventPage } from "@/lib/auth/load-event-page";
import { formatClockTime } from "@/lib/tech/format-clock-time";
import { loadChiefQueue } from "@/lib/tech/load-chief-queue";
import { closeReinspectionAction } from "./actions";

export const metadata: Metadata = { title: "Chief scrutineer" };

export default async function ChiefPage({ params }: { params: Promise<{ eventId: string }> }) {
  const { eventId } = await params;
  const { event } = await loadEventPage({
    eventId,
    permission: "verdicts.override",
    returnTo: `/tech/${eventId}/chief`,
  });
  const [{ waiting, decided }, open, numbers] = await Promise.all([
    loadChiefQueue({ eventId, timeZone: event.timeZone }),
    listOpenReinspections({ eventId }),
    listEventEntryNumbers({ eventId }),
  ]);
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
        <p className="text-base text-asphalt-700" aria-live="polite">
          {waiting.length} {waiting.length === 1 ? "car waits" : "cars wait"} for you. Tap a car to
          open its car card.
        </p>
        <ChiefQueue
          eventId={eventId}
          rows={waiting}
          testId="chief-queue"
          emptyText="Nothing waiting for you. Every car is either cleared or still in the queue."
        />
        {open.length > 0 ? (
          <section className="space-y-3" aria-labelledby="reinspections-title">
            <h2 id="reinspections-title" className="text-2xl font-bold">
              Sent back for re-inspection
            </h2>
            <p className="text-base text-asphalt-700">
              These cars show Waiting until you close their re-inspection. A scrutineer records what
              they found on the car card first.
            </p>
            {open.map((r) => (
              <ReinspectionCloseForm
                key={r.id}
                eventId={eventId}
                action={closeReinspectionAction}
                reinspection={{
                  ...r,
                  carNumber: numbers.get(r.entryId) ?? 0,
                  askedAtText: formatClockTime(r.askedAt, event.timeZone).slice(0, 5),
                }}
              />
            ))}
          </section>
        ) : null}
        <section className="space-y-3" aria-labelledby="chief-decided-title">
          <h2 id="chief-decided-title" className="text-2xl font-bold">
            Decided by the chief scrutineer
          </h2>
          <ChiefQueue
            eventId={eventId}
            rows={decided}
            testId="chief-decided"
            emptyText="No overrides yet."
          />
        </section>
      </div>
    </div>
  );
}
