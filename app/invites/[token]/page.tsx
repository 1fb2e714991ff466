import type { Metadata } from "next";
import Link from "next/link";
import { InviteAnswerForm } from "@/components/invite-answer-form";
import { getUserProfile } from "@/db/queries/accounts/get-user-profile";
import { getCoDriverInvite } from "@/db/queries/entering/get-co-driver-invite";
import { requirePageUser } from "@/lib/auth/require-page-permission";
import { clock } from "@/lib/clock";
import { inviteProblem } from "@/lib/entries/invite-problem";
import { formatEventDay } from "@/lib/passes/format-event-day";
import { acceptInviteAction, declineInviteAction } from "./actions";

export const metadata: Metadata = { title: "Co-driver invitation", referrer: "no-referrer" };

/** A co-driver invitation, answered by the signed-in person (whoever the link was mailed to). */
export default async function InvitePage({ params }: { params: Promise<{ token: string }> }) {
  const { token } = await params;
  const user = await requirePageUser(`/invites/${token}`);
  const invite = token.length <= 100 ? await getCoDriverInvite({ token }) : null;
  if (!invite) {
    return (
      <div className="space-y-4">
        <h1 className="text-3xl font-bold">Co-driver invitation</h1>
        <p className="card">This invitation link is not known. Ask the entrant to send it again.</p>
      </div>
    );
  }
  const problem = inviteProblem(invite, user.id, clock.now());
  const forSomeoneElse = invite.email !== user.email;
  return (
    <div className="space-y-4">
      <div>
        <p className="text-base font-semibold uppercase tracking-wider text-accent">
          Co-driver invitation
        </p>
        <h1 className="text-3xl font-bold">
          Car {invite.carNumber} at {invite.eventName}
        </h1>
        <p className="text-lg">
          {formatEventDay(invite.eventDate)} · {invite.carWords} · {invite.className}
        </p>
        <p className="text-lg">
          From {invite.driverName ?? invite.driverEmail}, to{" "}
          <span className="font-semibold" data-testid="invite-addressee">
            {invite.email}
          </span>
        </p>
      </div>
      {forSomeoneElse && !problem ? (
        <p className="card font-semibold" role="note" data-testid="invite-other-address">
          This invitation was sent to {invite.email}, and you are signed in as {user.email}. If you
          accept, you — not {invite.email} — become the co-driver.
        </p>
      ) : null}
      {problem ? (
        <div className="card space-y-3">
          <p className="font-semibold" role="alert">
            {problem}
          </p>
          <Link href="/garage" className="btn-secondary">
            Your garage
          </Link>
        </div>
      ) : (
        <InviteAnswerForm
          token={token}
          accept={acceptInviteAction}
          decline={declineInviteAction}
          defaultExperience={(await getUserProfile({ userId: user.id }))?.experienceLevel ?? null}
        />
      )}
    </div>
  );
}
