import type { Metadata } from "next";
import Link from "next/link";
import { forbidden, notFound } from "next/navigation";
import { WaiverCaution } from "@/components/waiver/waiver-caution";
import { WaiverSignForm } from "@/components/waiver/waiver-sign-form";
import { WaiverText } from "@/components/waiver/waiver-text";
import { getWaiverFacts } from "@/db/queries/waivers/get-waiver-facts";
import { requirePageUser } from "@/lib/auth/require-page-permission";
import { idSchema } from "@/lib/http/id-schema";
import { formatPassTime } from "@/lib/passes/format-pass-time";
import { formatEventDate } from "@/lib/run-sheet/format-event-date";
import { describeDriverWaivers } from "@/lib/waivers/describe-driver-waivers";
import { signWaiverAction } from "./actions";

export const metadata: Metadata = { title: "Waiver", robots: { index: false } };

const STATE_WORDS = {
  complete: "Accepted",
  "needs-guardian": "Signed; waiting for the parent or guardian",
  "not-signed": "Not signed yet",
} as const;

// GET /entries/[entryId]/waiver — the event's waiver in full; each driver of the entry accepts
// it with their own typed name (a minor's parent or guardian too, from an e-mailed link).
export default async function WaiverPage({ params }: { params: Promise<{ entryId: string }> }) {
  const { entryId } = await params;
  const user = await requirePageUser(`/entries/${entryId}/waiver`);
  if (!idSchema.safeParse(entryId).success) notFound();
  const facts = await getWaiverFacts({ entryId });
  if (!facts) notFound();
  if (user.id !== facts.driverId && user.id !== facts.coDriverId) forbidden();
  const lines = describeDriverWaivers(
    [
      {
        id: facts.driverId,
        name: facts.driverName,
        dateOfBirth: facts.driverDateOfBirth,
        role: "driver",
      },
      ...(facts.coDriverId
        ? [
            {
              id: facts.coDriverId,
              name: facts.coDriverName,
              dateOfBirth: facts.coDriverDateOfBirth,
              role: "co-driver",
            },
          ]
        : []),
    ],
    facts.waivers,
    facts.eventDate,
  );
  const mine = lines.find((l) => l.driverId === user.id);
  const closed = facts.entryStatus === "withdrawn" || facts.eventStatus === "finished";
  const time = (d: Date) => formatPassTime(Math.floor(d.getTime() / 1000), facts.timeZone);
  return (
    <div className="mx-auto max-w-2xl space-y-5">
      <div>
        <p className="text-base font-semibold uppercase tracking-wider text-accent">
          Car {facts.carNumber}
        </p>
        <h1 className="text-3xl font-bold">Waiver</h1>
        <p className="text-lg text-asphalt-800">
          {facts.eventName} · {formatEventDate(facts.eventDate)}
        </p>
      </div>
      <WaiverCaution />
      {facts.waiverText && facts.waiverVersion ? (
        <WaiverText text={facts.waiverText} version={facts.waiverVersion} />
      ) : (
        <p className="card">The organizer has not published this event&apos;s waiver yet.</p>
      )}
      <section
        className="card space-y-2"
        aria-label="Who has accepted"
        data-testid="waiver-drivers"
      >
        <h2 className="text-xl font-bold">Every driver accepts it</h2>
        <ul className="space-y-2">
          {lines.map((l) => (
            <li key={l.driverId} data-testid="waiver-driver" data-state={l.state}>
              <span className="font-semibold">{l.who}</span>: {STATE_WORDS[l.state]}
              {l.signedAt ? ` (${time(l.signedAt)}, version ${l.textVersion})` : ""}
              {l.state === "needs-guardian" && l.guardianEmail
                ? ` — link sent to ${l.guardianEmail}`
                : ""}
            </li>
          ))}
        </ul>
      </section>
      {mine && mine.state !== "complete" && !closed && facts.waiverText ? (
        <WaiverSignForm
          entryId={entryId}
          minor={mine.minor}
          renewing={mine.state === "needs-guardian"}
          action={signWaiverAction}
        />
      ) : null}
      {closed ? (
        <p className="card">
          {facts.entryStatus === "withdrawn" ? "This entry was withdrawn." : "This event is over."}
        </p>
      ) : null}
      <Link href={`/entries/${entryId}`} className="btn-secondary w-full sm:w-auto">
        Back to the entry
      </Link>
    </div>
  );
}
