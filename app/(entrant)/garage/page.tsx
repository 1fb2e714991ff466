import { dehydrate, HydrationBoundary } from "@tanstack/react-query";
import type { Metadata } from "next";
import Link from "next/link";
import { CarForm } from "@/components/car-form";
import { CarList } from "@/components/car-list";
import { CarNumberChip } from "@/components/car-number-chip";
import { ClassLine } from "@/components/class-line";
import { VerdictBadge } from "@/components/verdict-badge";
import { listGarage } from "@/db/queries/list-garage";
import { requirePageUser } from "@/lib/auth/require-page-permission";
import { classMove } from "@/lib/entries/class-move";
import { formatEventDay } from "@/lib/passes/format-event-day";
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
              <li key={e.entryId} className="card space-y-3" data-testid="entrant-entry">
                <div className="flex items-start gap-3">
                  <CarNumberChip carNumber={e.carNumber} />
                  <div className="min-w-0">
                    <p className="text-lg font-semibold">{e.eventName}</p>
                    <p className="text-base text-asphalt-800">
                      <time dateTime={e.eventDate}>{formatEventDay(e.eventDate)}</time> · {e.make}{" "}
                      {e.model}
                    </p>
                    <ClassLine
                      move={classMove({
                        declaredClass: e.declaredClass,
                        finalClass: e.finalClass,
                        status: e.status,
                      })}
                    />
                  </div>
                </div>
                <div className="flex flex-wrap items-center gap-3">
                  {e.entryStatus === "entered" ? (
                    <VerdictBadge status={e.status} toClass={e.finalClass} />
                  ) : (
                    <span
                      className="rounded-full border-2 border-asphalt-400 px-3 py-1 font-semibold"
                      data-testid="entry-standing"
                    >
                      {e.entryStatus === "withdrawn" ? "Withdrawn" : "On the waiting list"}
                    </span>
                  )}
                  <div className="ml-auto flex gap-2">
                    <Link
                      href={`/entries/${e.entryId}`}
                      className="btn-secondary min-w-touch"
                      data-testid="entry-result-link"
                      aria-label={`Result for car ${e.carNumber}, ${e.eventName}`}
                    >
                      {e.entryStatus === "entered" ? "Result" : "Entry"}
                    </Link>
                    {e.entryStatus !== "entered" ? null : (
                      <Link
                        href={`/entries/${e.entryId}/pass`}
                        className="btn-secondary min-w-touch"
                        data-testid="entry-pass-link"
                        aria-label={`Pass for car ${e.carNumber}, ${e.eventName}`}
                      >
                        Pass
                      </Link>
                    )}
                  </div>
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
          <CarForm />
        </section>
      </HydrationBoundary>
    </div>
  );
}
