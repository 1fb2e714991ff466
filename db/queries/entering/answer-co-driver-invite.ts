import "server-only";
import { eq } from "drizzle-orm";
import { hashInviteToken } from "../../../lib/entries/co-driver-invite-token";
import { inviteProblem } from "../../../lib/entries/invite-problem";
import { AppError } from "../../../lib/errors";
import type { ExperienceLevel } from "../../../lib/paddock/drive";
import { runTransaction } from "../../run-transaction";
import { coDriverInvites, entries } from "../../schema";

/**
 * The signed-in person answers the invitation the token names. Accepting makes them the entry's
 * co-driver with their own lap-time estimate and experience; declining closes the invitation.
 * The invitation's and the entry's rows are locked, so two acceptances of one entry (two links,
 * two people) leave one co-driver. Whoever is signed in may accept, even when the invitation was
 * sent to another address (the page shows whose it is first).
 */
export async function answerCoDriverInvite(
  opts: { token: string; userId: string; now: Date } & (
    | { answer: "accept"; lapTimeEstimateMs: number; experience: ExperienceLevel }
    | { answer: "decline" }
  ),
): Promise<{ entryId: string }> {
  return runTransaction(async (tx) => {
    const [invite] = await tx
      .select()
      .from(coDriverInvites)
      .where(eq(coDriverInvites.tokenHash, hashInviteToken(opts.token)))
      .for("update");
    if (!invite) throw new AppError("not_found", "This invitation link is not known.");
    const [entry] = await tx
      .select({
        status: entries.status,
        driverId: entries.driverId,
        coDriverId: entries.coDriverId,
      })
      .from(entries)
      .where(eq(entries.id, invite.entryId))
      .for("update");
    if (!entry) throw new AppError("not_found", "This invitation link is not known.");
    if (opts.answer === "decline") {
      if (invite.acceptedAt || invite.closedAt) {
        throw new AppError("conflict", "This invitation is no longer open.");
      }
      await tx
        .update(coDriverInvites)
        .set({ closedAt: opts.now })
        .where(eq(coDriverInvites.id, invite.id));
      return { entryId: invite.entryId };
    }
    const problem = inviteProblem(
      {
        ...invite,
        entryStatus: entry.status,
        driverId: entry.driverId,
        coDriverId: entry.coDriverId,
      },
      opts.userId,
      opts.now,
    );
    if (problem) throw new AppError("conflict", problem);
    await tx
      .update(entries)
      .set({
        coDriverId: opts.userId,
        coDriverLapTimeEstimateMs: opts.lapTimeEstimateMs,
        coDriverExperience: opts.experience,
        updatedAt: opts.now,
      })
      .where(eq(entries.id, invite.entryId));
    await tx
      .update(coDriverInvites)
      .set({ acceptedAt: opts.now, acceptedBy: opts.userId })
      .where(eq(coDriverInvites.id, invite.id));
    return { entryId: invite.entryId };
  });
}
