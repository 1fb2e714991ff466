import type { Metadata } from "next";
import { EventHeading } from "@/components/event-heading";
import { RegistrationTable } from "@/components/registration-table";
import { loadEventPage } from "@/lib/auth/load-event-page";
import { signOnState } from "@/lib/entries/sign-on-state";
import { loadRegistrationRows } from "@/lib/registration/load-registration-rows";

export const metadata: Metadata = { title: "Registration" };

// GET /registration/[eventId] — the sign-on desk: each entry's waiver and fee, searchable by car
// number or name, sortable, and downloadable as CSV.
export default async function RegistrationPage({
  params,
}: {
  params: Promise<{ eventId: string }>;
}) {
  const { eventId } = await params;
  const { event } = await loadEventPage({
    eventId,
    permission: "registration.check",
    returnTo: `/registration/${eventId}`,
  });
  const rows = await loadRegistrationRows({ eventId });
  const ready = rows.filter((r) => signOnState(r).signedOn);
  return (
    <div>
      <EventHeading roleLabel="Registration" title="Sign-on desk" event={event}>
        <p className="text-lg">
          <strong className="tabular">{ready.length}</strong> of{" "}
          <span className="tabular">{rows.length}</span> entries are signed on: waiver signed (by a
          guardian too for a minor) and fee paid.
        </p>
      </EventHeading>
      <RegistrationTable rows={rows} csvPath={`/api/events/${eventId}/registration/csv`} />
    </div>
  );
}
