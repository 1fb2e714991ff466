import { dehydrate, HydrationBoundary } from "@tanstack/react-query";
import type { Metadata } from "next";
import { ClerkDesk } from "@/components/clerk/clerk-desk";
import { EventHeading } from "@/components/event-heading";
import { loadEventPage } from "@/lib/auth/load-event-page";
import { clock } from "@/lib/clock";
import { getQueryClient } from "@/lib/query/get-query-client";
import { runGroupKeys } from "@/lib/query/run-group-queries";
import { loadClerkView } from "@/lib/run-sheet/load-clerk-view";
import {
  askReinspectionAction,
  buildRunGroupsAction,
  callSessionAction,
  publishRunSheetAction,
  saveRunGroupsAction,
} from "./actions";

export const metadata: Metadata = { title: "Clerk of course" };

// GET /clerk/[eventId] — the clerk of course's page: cars at a glance, the day's settings, run
// groups (build, move, reorder, live checks), publishing the run sheet, the day's session marks.
export default async function ClerkPage({ params }: { params: Promise<{ eventId: string }> }) {
  const { eventId } = await params;
  const { event } = await loadEventPage({
    eventId,
    permission: "run-groups.write",
    returnTo: `/clerk/${eventId}`,
  });
  const view = await loadClerkView({ eventId, now: clock.now() });
  const queryClient = getQueryClient();
  queryClient.setQueryData(runGroupKeys.clerkView(eventId), view);
  return (
    <div className="space-y-4">
      <EventHeading roleLabel="Clerk of course" title="Run groups and the run sheet" event={event}>
        <p className="text-lg" data-testid="ready-summary">
          <strong className="tabular">{view.cars.filter((c) => c.ready).length}</strong> of{" "}
          <span className="tabular">{view.cars.length}</span> cars are ready to run: cleared at the
          tech line and signed on. Only these go into run groups.
        </p>
      </EventHeading>
      <HydrationBoundary state={dehydrate(queryClient)}>
        <ClerkDesk
          eventId={eventId}
          actions={{
            build: buildRunGroupsAction,
            save: saveRunGroupsAction,
            publish: publishRunSheetAction,
            callSession: callSessionAction,
            askReinspection: askReinspectionAction,
          }}
        />
      </HydrationBoundary>
    </div>
  );
}
