import type { Metadata } from "next";
import Link from "next/link";
import { PrecheckWorkbench } from "@/components/precheck/precheck-workbench";
import { listAeroPlans } from "@/db/queries/aero-plans/list-aero-plans";
import { listPlanCars } from "@/db/queries/aero-plans/list-plan-cars";
import { listPrecheckEvents } from "@/db/queries/aero-plans/list-precheck-events";
import { getSessionUser } from "@/lib/auth/get-session-user";
import { deleteAeroPlanAction, saveAeroPlanAction } from "./actions";

export const metadata: Metadata = { title: "Aero pre-check" };

// Public: anyone designing a wing may check it, signed in or not. The rule sets of the upcoming
// events come with the page, so the check runs in the browser and keeps working offline.
export default async function PrecheckPage({
  searchParams,
}: {
  searchParams: Promise<Record<string, string | string[] | undefined>>;
}) {
  const { event: asked } = await searchParams;
  const [events, user] = await Promise.all([listPrecheckEvents(), getSessionUser()]);
  const named = typeof asked === "string" ? events.find((e) => e.slug === asked) : undefined;
  const next = events.find((e) => e.status === "entries-open") ?? events[0];
  const defaultSlug = named?.slug ?? next?.slug ?? "";
  const entrant = user
    ? await Promise.all([listPlanCars({ ownerId: user.id }), listAeroPlans({ ownerId: user.id })])
    : null;
  return (
    <div className="mx-auto max-w-2xl space-y-6">
      <div>
        <p className="text-base font-semibold uppercase tracking-wider text-accent">Pre-check</p>
        <h1 className="text-3xl font-bold">Will your wing fit?</h1>
        <p className="text-lg">
          Describe the car and the wing you plan to build; see for every class whether it fits and
          by how much. Works without an account, and without signal once the page has loaded.
        </p>
        {user ? null : (
          <p className="text-base text-asphalt-800">
            <Link href="/sign-in?callbackUrl=/pre-check" className="underline">
              Sign in
            </Link>{" "}
            to save a plan against one of your cars.
          </p>
        )}
      </div>
      <PrecheckWorkbench
        events={events.map(({ slug, name, eventDate, unitSystem, ruleSet }) => ({
          slug,
          name,
          eventDate,
          unitSystem,
          ruleSet,
        }))}
        defaultSlug={defaultSlug}
        entrant={
          entrant
            ? {
                cars: entrant[0].map((c) => ({ id: c.id, name: `${c.year} ${c.make} ${c.model}` })),
                plans: entrant[1].map((p) => ({
                  id: p.id,
                  name: p.name,
                  carName: p.carName,
                  plan: p.plan,
                })),
              }
            : null
        }
        saveAction={saveAeroPlanAction}
        deleteAction={deleteAeroPlanAction}
      />
      <p className="text-base text-asphalt-800">
        Motorsport can kill. This pre-check is a design aid: the sanctioning body's rulebook, the
        chief scrutineer on the day and local law decide. Measure with the car on a level surface
        and nobody under a car that is not secured.
      </p>
    </div>
  );
}
