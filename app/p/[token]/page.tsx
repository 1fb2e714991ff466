import type { Metadata } from "next";
import Link from "next/link";
import { Caution } from "@/components/caution";
import { PassRevokeForm } from "@/components/pass-revoke-form";
import { PassState } from "@/components/pass-state";
import { PassCarLine, PassFacts } from "@/components/pass-summary";
import { getEntryForPass } from "@/db/queries/get-entry-for-pass";
import { getEventRoles } from "@/db/queries/get-event-roles";
import { getSessionUser } from "@/lib/auth/get-session-user";
import { can } from "@/lib/auth/permissions";
import { clock } from "@/lib/clock";
import { formatPassTime } from "@/lib/passes/format-pass-time";
import { passClassMove } from "@/lib/passes/pass-class-move";
import { extractPassToken } from "@/lib/passes/pass-url";
import { verifyPassOnServer } from "@/lib/passes/verify-pass-on-server";
import { revokePassAction } from "./actions";

export const metadata: Metadata = { title: "Pass check", robots: { index: false } };

// GET /p/[token] — what an ordinary phone camera opens from a pass QR: the server verifies the
// pass with the same code the tech line runs and shows what it names, without personal details.
export default async function PassCheckPage({ params }: { params: Promise<{ token: string }> }) {
  const { token: raw } = await params;
  const token = extractPassToken(raw) ?? "";
  const { eventId, result } = await verifyPassOnServer({ token, now: clock.now() });
  // Present only when the signature checked out (valid, or refused for time/revocation/event).
  const claims = result.claims;
  const [entry, user] = await Promise.all([
    claims ? getEntryForPass({ entryId: claims.ent }) : null,
    getSessionUser(),
  ]);
  const roles = user && eventId ? await getEventRoles({ eventId, userId: user.id }) : [];
  const returnTo = `/p/${token}`;
  return (
    <div className="mx-auto max-w-md space-y-5">
      <div>
        <p className="text-base font-semibold uppercase tracking-wider text-accent">Pass check</p>
        <h1 className="text-3xl font-bold">{claims ? `Car ${claims.car}` : "Plumbline pass"}</h1>
      </div>
      <PassState valid={result.ok} message={result.ok ? undefined : result.message} />
      {claims ? (
        <section className="card space-y-4">
          {entry ? <PassCarLine carNumber={claims.car} move={passClassMove(entry)} /> : null}
          <PassFacts
            eventName={entry?.eventName ?? null}
            eventDate={entry?.eventDate ?? null}
            validUntil={formatPassTime(claims.exp, entry?.timeZone ?? "UTC")}
          />
        </section>
      ) : null}
      {result.ok && can(roles, "tech.read") ? (
        <Link
          href={`/tech/${claims?.evt}?entry=${claims?.ent}`}
          className="btn-primary w-full text-lg"
          data-testid="open-on-tech-line"
        >
          Open car {claims?.car} on the tech line
        </Link>
      ) : null}
      {result.ok && !user ? (
        <Link
          href={`/sign-in?callbackUrl=${encodeURIComponent(returnTo)}`}
          className="btn-secondary w-full"
        >
          Officials: sign in to open this car
        </Link>
      ) : null}
      <Caution title="A pass is not a clearance">
        It only identifies the entry. Scrutineering and the chief scrutineer decide whether a car
        runs.
      </Caution>
      {claims &&
      eventId &&
      can(roles, "event.manage") &&
      !(!result.ok && result.code === "revoked") ? (
        <PassRevokeForm token={token} action={revokePassAction} />
      ) : null}
    </div>
  );
}
