import type { Metadata } from "next";
import Link from "next/link";
import { listPublicEvents } from "@/db/queries/entering/list-public-events";
import { clock } from "@/lib/clock";
import { eventStatusWord } from "@/lib/entries/event-status-word";
import { formatEntryWindow } from "@/lib/entries/format-entry-window";
import { placesLeft } from "@/lib/entries/places-left";
import { formatMoney } from "@/lib/format-money";
import { classNamesFromRuleSet } from "@/lib/passes/class-names-from-rule-set";
import { formatEventDay } from "@/lib/passes/format-event-day";

export const metadata: Metadata = { title: "Events" };

/** The public list of events: anyone may read it, signed in or not. */
export default async function EventsPage() {
  const events = await listPublicEvents();
  const now = clock.now();
  return (
    <div className="space-y-6">
      <div>
        <p className="text-base font-semibold uppercase tracking-wider text-accent">Enter</p>
        <h1 className="text-3xl font-bold">Events</h1>
      </div>
      {events.length === 0 ? (
        <p className="card">No events are open yet.</p>
      ) : (
        <ul className="space-y-3" data-testid="event-list">
          {events.map((e) => {
            const left = placesLeft({ capacity: e.capacity, entered: Number(e.entered) });
            return (
              <li key={e.id} className="card space-y-2" data-testid="event-card">
                <h2 className="text-2xl font-bold">
                  <Link href={`/events/${e.slug}`} className="underline underline-offset-4">
                    {e.name}
                  </Link>
                </h2>
                <p className="text-lg">
                  <time dateTime={e.eventDate}>{formatEventDay(e.eventDate)}</time> · {e.venueName}
                </p>
                <p className="text-base text-asphalt-800">{e.clubName}</p>
                <dl className="grid grid-cols-[auto_1fr] gap-x-4 gap-y-1 text-base">
                  <dt className="font-semibold">Classes</dt>
                  <dd>{Object.values(classNamesFromRuleSet(e.ruleSetBody)).join(", ")}</dd>
                  <dt className="font-semibold">Entry fee</dt>
                  <dd className="tabular">{formatMoney(e.entryFeeMinor, e.currency)}</dd>
                  <dt className="font-semibold">Places left</dt>
                  <dd className="tabular" data-testid="places-left">
                    {left === 0
                      ? `None of ${e.capacity}: new entries join the waiting list`
                      : `${left} of ${e.capacity}`}
                  </dd>
                  <dt className="font-semibold">Entries</dt>
                  <dd>
                    {formatEntryWindow({
                      opensAt: e.entriesOpenAt,
                      closesAt: e.entriesCloseAt,
                      timeZone: e.timeZone,
                    })}
                  </dd>
                  <dt className="font-semibold">Status</dt>
                  <dd data-testid="event-status">
                    {eventStatusWord(
                      { status: e.status, opensAt: e.entriesOpenAt, closesAt: e.entriesCloseAt },
                      now,
                    )}
                  </dd>
                </dl>
                <Link href={`/events/${e.slug}`} className="btn-secondary min-w-touch">
                  See the event
                </Link>
              </li>
            );
          })}
        </ul>
      )}
    </div>
  );
}
