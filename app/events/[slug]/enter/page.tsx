import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { EntryForm } from "@/components/entry-form";
import { getUserProfile } from "@/db/queries/accounts/get-user-profile";
import { listAeroPlans } from "@/db/queries/aero-plans/list-aero-plans";
import { getPublicEvent } from "@/db/queries/entering/get-public-event";
import { listEnterableCars } from "@/db/queries/entering/list-enterable-cars";
import { getEventRuleSet } from "@/db/queries/get-event-rule-set";
import { requirePageUser } from "@/lib/auth/require-page-permission";
import { clock } from "@/lib/clock";
import { classSummaries } from "@/lib/entries/class-summaries";
import { entryWindowProblem } from "@/lib/entries/entry-window-problem";
import { placesLeft } from "@/lib/entries/places-left";
import { formatMoney } from "@/lib/format-money";
import { formatEventDay } from "@/lib/passes/format-event-day";
import { fitCarToClasses } from "@/lib/scrutineer/aero/fit-car-to-classes";
import { describeRuleSet } from "@/lib/scrutineer/rule-sets/describe-rule-set";
import { displayUnits } from "@/lib/scrutineer/units/display-units";
import { enterEventAction } from "./actions";

export const metadata: Metadata = { title: "Enter an event" };

/** The entry form: one of your cars, a class, your estimate and experience, a co-driver. */
export default async function EnterEventPage({ params }: { params: Promise<{ slug: string }> }) {
  const { slug } = await params;
  const user = await requirePageUser(`/events/${slug}/enter`);
  if (slug.length > 80) notFound();
  const event = await getPublicEvent({ slug });
  if (!event) notFound();
  const rules = await getEventRuleSet({ eventId: event.id });
  if (!rules) notFound();
  const problem = entryWindowProblem(
    { status: event.status, opensAt: event.entriesOpenAt, closesAt: event.entriesCloseAt },
    clock.now(),
  );
  const [cars, plans, profile] = await Promise.all([
    listEnterableCars({ userId: user.id, eventId: event.id }),
    listAeroPlans({ ownerId: user.id }),
    getUserProfile({ userId: user.id }),
  ]);
  // The pre-check beside each class: each car's newest saved wing plan on its own figures (a
  // car with no plan gets a pointer to the pre-check instead).
  const classFits = Object.fromEntries(
    cars.flatMap((car) => {
      const plan = plans.find((p) => p.carId === car.id)?.plan;
      return plan ? [[car.id, fitCarToClasses({ car, plan, ruleSet: rules.ruleSet })]] : [];
    }),
  );
  const left = placesLeft({ capacity: event.capacity, entered: event.entered });
  return (
    <div className="space-y-6">
      <div>
        <p className="text-base font-semibold uppercase tracking-wider text-accent">Enter</p>
        <h1 className="text-3xl font-bold">{event.name}</h1>
        <p className="text-lg">
          {formatEventDay(event.eventDate)} · {event.venueName} ·{" "}
          {formatMoney(event.entryFeeMinor, event.currency)}
        </p>
        <p className="text-base" data-testid="places-left">
          {left === 0
            ? "The field is full: your entry joins the waiting list, in order of entry."
            : `${left} of ${event.capacity} places left.`}
        </p>
      </div>
      {problem ? (
        <p className="card font-semibold" role="alert">
          {problem}
        </p>
      ) : cars.length === 0 ? (
        <div className="card space-y-3">
          <p>
            You have no car that can enter: add one to your garage first (a retired car, or one
            already entered here, is not offered).
          </p>
          <Link href="/garage" className="btn-primary">
            Go to your garage
          </Link>
        </div>
      ) : (
        <EntryForm
          eventSlug={event.slug}
          cars={cars.map((c) => ({
            id: c.id,
            label: `${c.year} ${c.make} ${c.model} (${c.colour})`,
          }))}
          classes={classSummaries(
            describeRuleSet(rules.ruleSet, displayUnits({ length: rules.unitSystem })),
          )}
          classFits={classFits}
          defaultExperience={profile?.experienceLevel ?? null}
          action={enterEventAction}
        />
      )}
    </div>
  );
}
