import type { Metadata } from "next";
import { GuardianAcceptForm } from "@/components/waiver/guardian-accept-form";
import { WaiverCaution } from "@/components/waiver/waiver-caution";
import { WaiverText } from "@/components/waiver/waiver-text";
import { getGuardianWaiver } from "@/db/queries/waivers/get-guardian-waiver";
import { clock } from "@/lib/clock";
import { formatEventDate } from "@/lib/run-sheet/format-event-date";
import { guardianLinkExpired } from "@/lib/waivers/guardian-link-expired";
import { hashGuardianToken } from "@/lib/waivers/hash-guardian-token";
import { acceptGuardianWaiverInputSchema } from "@/lib/waivers/waiver-input-schemas";
import { acceptGuardianWaiverAction } from "./actions";

export const metadata: Metadata = {
  title: "A waiver for you to accept",
  robots: { index: false, follow: false },
};

function Notice({ title, children }: { title: string; children: React.ReactNode }) {
  return (
    <div className="mx-auto max-w-2xl space-y-3" data-testid="guardian-notice">
      <h1 className="text-3xl font-bold">{title}</h1>
      <p className="card text-lg">{children}</p>
    </div>
  );
}

// GET /guardian/[token] — public: a minor's parent or guardian reads the waiver and accepts it.
// The token (only its SHA-256 is stored) is the proof; no account is needed.
export default async function GuardianPage({ params }: { params: Promise<{ token: string }> }) {
  const { token } = await params;
  const valid = acceptGuardianWaiverInputSchema.shape.token.safeParse(token).success;
  const row = valid ? await getGuardianWaiver({ tokenHash: hashGuardianToken(token) }) : null;
  if (!row) {
    return (
      <Notice title="This link does not work">
        It is not complete, or a newer request replaced it. Use the link in the latest e-mail, or
        ask the driver to send the request again.
      </Notice>
    );
  }
  const minorName = row.minorName ?? "the driver";
  if (row.guardianSignedAt !== null) {
    return (
      <Notice title="Already accepted">
        This link has been used: {minorName}&apos;s waiver for {row.eventName} is accepted. Nothing
        more is needed.
      </Notice>
    );
  }
  if (
    row.guardianRequestedAt === null ||
    guardianLinkExpired(row.guardianRequestedAt, clock.now())
  ) {
    return (
      <Notice title="This link has expired">
        Ask {minorName} to send the request again from their waiver page.
      </Notice>
    );
  }
  return (
    <div className="mx-auto max-w-2xl space-y-5">
      <div>
        <p className="text-base font-semibold uppercase tracking-wider text-accent">
          For a parent or guardian
        </p>
        <h1 className="text-3xl font-bold">{minorName} asks you to accept the waiver</h1>
        <p className="text-lg text-asphalt-800">
          {row.eventName} · {formatEventDate(row.eventDate)} · car {row.carNumber}
        </p>
      </div>
      <p className="text-lg">
        {minorName} is under 18 on the day of the event, so they may drive only once a parent or
        guardian has read and accepted the event&apos;s waiver. Read it in full below.
      </p>
      <WaiverCaution />
      {row.waiverText ? <WaiverText text={row.waiverText} version={row.textVersion} /> : null}
      {row.waiverVersion && row.waiverVersion !== row.textVersion ? (
        <p className="card">
          The organizer has changed the waiver since {minorName} signed (now version{" "}
          {row.waiverVersion}); you accept the version shown.
        </p>
      ) : null}
      <GuardianAcceptForm token={token} minorName={minorName} action={acceptGuardianWaiverAction} />
    </div>
  );
}
