import { dehydrate, HydrationBoundary } from "@tanstack/react-query";
import type { Metadata } from "next";
import Link from "next/link";
import { AddCarForm } from "@/components/add-car-form";
import { CarList } from "@/components/car-list";
import { VerdictBadge } from "@/components/verdict-badge";
import { listGarage } from "@/db/queries/list-garage";
import { requirePageUser } from "@/lib/auth/require-page-permission";
import { garageKeys } from "@/lib/query/garage-queries";
import { getQueryClient } from "@/lib/query/get-query-client";

export const metadata: Metadata = { title: "Your garage" };

export default async function GaragePage() {
  const user = await requirePageUser("/garage");
  const garage = await listGarage({ userId: user.id });
  const queryClient = getQueryClient();
  queryClient.setQueryData(garageKeys.cars(), garage.cars);
  return (
    <div className="space-y-8">
      <div>
        <p className="text-base font-semibold uppercase tracking-wider text-accent">Entrant</p>
        <h1 className="text-3xl font-bold">Your garage</h1>
      </div>
      <section className="space-y-3">
        <h2 className="text-2xl font-bold">Your entries</h2>
        {garage.entries.length === 0 ? (
          <p className="card">You have not entered an event yet.</p>
        ) : (
          <ul className="space-y-2" data-testid="entrant-entries">
            {garage.entries.map((e) => (
              <li
                key={e.entryId}
                className="card flex flex-wrap items-center justify-between gap-3"
              >
                <div className="flex items-center gap-3">
                  <span className="tabular rounded-md bg-asphalt-950 px-2 py-1 text-2xl font-bold text-asphalt-50">
                    {e.carNumber}
                  </span>
                  <div>
                    <p className="text-lg font-semibold">{e.eventName}</p>
                    <p className="text-base text-asphalt-800">
                      {e.eventDate} · {e.make} {e.model} · {e.declaredClass}
                    </p>
                  </div>
                </div>
                <div className="flex items-center gap-3">
                  <VerdictBadge status={e.status} toClass={e.finalClass} />
                  <Link
                    href={`/entries/${e.entryId}`}
                    className="btn-secondary min-w-touch"
                    data-testid="entry-result-link"
                    aria-label={`Result for car ${e.carNumber}, ${e.eventName}`}
                  >
                    Result
                  </Link>
                  <Link
                    href={`/entries/${e.entryId}/pass`}
                    className="btn-secondary min-w-touch"
                    data-testid="entry-pass-link"
                    aria-label={`Pass for car ${e.carNumber}, ${e.eventName}`}
                  >
                    Pass
                  </Link>
                </div>
              </li>
            ))}
          </ul>
        )}
      </section>
      <HydrationBoundary state={dehydrate(queryClient)}>
        <section className="space-y-3">
          <h2 className="text-2xl font-bold">Your cars</h2>
          <CarList />
          <AddCarForm />
        </section>
      </HydrationBoundary>
    </div>
  );
}
