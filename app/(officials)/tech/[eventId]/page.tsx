import type { Metadata } from "next";
import Link from "next/link";
import { Caution } from "@/components/caution";
import { EventHeading } from "@/components/event-heading";
import { TechLineApp } from "@/components/tech/tech-line-app";
import { loadEventPage } from "@/lib/auth/load-event-page";
import { can } from "@/lib/auth/permissions";
import { personName } from "@/lib/auth/person-name";

export const metadata: Metadata = { title: "Tech line" };

export default async function TechLinePage({ params }: { params: Promise<{ eventId: string }> }) {
  const { eventId } = await params;
  const { event, roles, user } = await loadEventPage({
    eventId,
    permission: "tech.read",
    returnTo: `/tech/${eventId}`,
  });
  const canChief = can(roles, "verdicts.override");
  const pagePaths = [`/tech/${eventId}`, ...(canChief ? [`/tech/${eventId}/chief`] : [])];
  return (
    <div>
      <EventHeading roleLabel="Tech line" title="Scrutineering" event={event}>
        {canChief ? (
          <Link href={`/tech/${eventId}/chief`} className="btn-secondary">
            Chief scrutineer&apos;s queue
          </Link>
        ) : null}
      </EventHeading>
      <div className="space-y-4">
        <Caution title="On the pad">
          Engine off, car on the level pad, and nobody under a car that is not secured. The verdicts
          here are computed; the chief scrutineer has the final say.
        </Caution>
        <TechLineApp
          eventId={eventId}
          official={{ id: user.id, name: personName(user) || "Official" }}
          canWrite={can(roles, "readings.write")}
          canChief={canChief}
          pagePaths={pagePaths}
        />
      </div>
    </div>
  );
}
