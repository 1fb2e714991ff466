import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { Caution } from "@/components/caution";
import { RuleSetDescriptionView } from "@/components/rules/rule-set-description";
import { getPublicEvent } from "@/db/queries/entering/get-public-event";
import { getEventRuleSet } from "@/db/queries/get-event-rule-set";
import { clock } from "@/lib/clock";
import { describeRefundPolicy } from "@/lib/entries/describe-refund-policy";
import { entryWindowProblem } from "@/lib/entries/entry-window-problem";
import { eventStatusWord } from "@/lib/entries/event-status-word";
import { formatEntryWindow } from "@/lib/entries/format-entry-window";
import { placesLeft } from "@/lib/entries/places-left";
import { refundPolicySchema } from "@/lib/entries/refund-policy-schema";
import { formatMoney } from "@/lib/format-money";
import { formatEventDay } from "@/lib/passes/format-event-day";
import { describeRuleSet } from "@/lib/scrutineer/rule-sets/describe-rule-set";
import { displayUnits } from "@/lib/scrutineer/units/display-units";

export const metadata: Metadata = { title: "Event" };

/** An event for anyone: when and where, the classes' rules in words, fee, places, the waiver. */
export default async function EventPage({ params }: { params: Promise<{ slug: string }> }) {
  const { slug } = await params;
  if (slug.length > 80) notFound();
  const event = await getPublicEvent({ slug });
  if (!event) notFound();
  const rules = await getEventRuleSet({ eventId: event.id });
  if (!rules) notFound();
  const now = clock.now();
  const window = {
    status: event.status,
    opensAt: event.entriesOpenAt,
    closesAt: event.entriesCloseAt,
  };
  const taking = entryWindowProblem(window, now);
  const left = placesLeft({ capacity: event.capacity, entered: event.entered });
  const policy = refundPolicySchema.safeParse(event.refundPolicy);
  const fee = formatMoney(event.entryFeeMinor, event.currency);
  return (
    <div className="space-y-6">
      <div>
        <p className="text-base font-semibold uppercase tracking-wider text-accent">
          {event.clubName}
        </p>
        <h1 className="text-3xl font-bold">{event.name}</h1>
        <p className="text-lg">
          <time dateTime={event.eventDate}>{formatEventDay(event.eventDate)}</time> ·{" "}
          {event.venueName}
        </p>
      </div>
      <dl
        className="card grid grid-cols-[auto_1fr] gap-x-4 gap-y-2 text-base"
        data-testid="event-facts"
      >
        <dt className="font-semibold">Status</dt>
        <dd>{eventStatusWord(window, now)}</dd>
        <dt className="font-semibold">Entry fee</dt>
        <dd className="tabular">{fee}</dd>
        <dt className="font-semibold">Places left</dt>
        <dd className="tabular" data-testid="places-left">
          {left === 0
            ? `None of ${event.capacity}: new entries join the waiting list (${event.waiting} waiting)`
            : `${left} of ${event.capacity}`}
        </dd>
        <dt className="font-semibold">Entries</dt>
        <dd>
          {formatEntryWindow({
            opensAt: event.entriesOpenAt,
            closesAt: event.entriesCloseAt,
            timeZone: event.timeZone,
          })}
        </dd>
      </dl>
      <div className="flex flex-wrap gap-3">
        {taking === null ? (
          <Link href={`/events/${event.slug}/enter`} className="btn-primary">
            Enter this event
          </Link>
        ) : (
          <p className="card font-semibold">{taking}</p>
        )}
        <Link href={`/pre-check?event=${encodeURIComponent(event.slug)}`} className="btn-secondary">
          Pre-check a wing design
        </Link>
      </div>
      <section className="space-y-3">
        <h2 className="text-2xl font-bold">Refunds</h2>
        <ul className="card list-disc space-y-1 pl-8" data-testid="refund-policy">
          {describeRefundPolicy(policy.success ? policy.data : null, {
            amountMinor: event.entryFeeMinor,
            currency: event.currency,
          }).map((line) => (
            <li key={line}>{line}</li>
          ))}
        </ul>
      </section>
      <section className="space-y-3">
        <h2 className="text-2xl font-bold">Classes and their rules</h2>
        <RuleSetDescriptionView
          description={describeRuleSet(rules.ruleSet, displayUnits({ length: rules.unitSystem }))}
        />
      </section>
      <section className="space-y-3">
        <h2 className="text-2xl font-bold">The waiver</h2>
        {event.waiverText ? (
          <div className="card space-y-2" data-testid="waiver-text">
            {event.waiverVersion ? (
              <p className="text-base text-asphalt-700">Version {event.waiverVersion}</p>
            ) : null}
            <p className="whitespace-pre-line text-base">{event.waiverText}</p>
          </div>
        ) : (
          <p className="card">The organizer has not published the waiver yet.</p>
        )}
      </section>
      <Caution title="Before you enter">
        Motorsport is dangerous. The sanctioning body&apos;s rulebook governs the event and the
        chief scrutineer has the final say on every car; Plumbline only records and computes.
      </Caution>
    </div>
  );
}
