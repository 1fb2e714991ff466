import "server-only";
import { and, eq, isNull } from "drizzle-orm";
import { v7 as uuidv7 } from "uuid";
import {
  CO_DRIVER_INVITE_DAYS,
  hashInviteToken,
  newInviteToken,
} from "../../../lib/entries/co-driver-invite-token";
import { SEND_MAIL } from "../../../lib/jobs/job-kinds";
import { composeCoDriverInviteMail } from "../../../lib/mail/compose-co-driver-invite-mail";
import type { Tx } from "../../run-transaction";
import { coDriverInvites } from "../../schema";
import { enqueueJobs } from "../jobs/enqueue-jobs";

/**
 * Invite `email` to co-drive the entry, inside the caller's transaction: any invitation still
 * open for the entry is closed (the newest one is the only one that works), the new one stored
 * with only its token's SHA-256, and the invitation e-mail queued. Returns the token (for the
 * mail's link only; it is not kept).
 */
export async function insertCoDriverInvite(
  tx: Tx,
  opts: {
    entryId: string;
    eventId: string;
    email: string;
    invitedBy: string;
    now: Date;
    appUrl: string;
    mail: Omit<Parameters<typeof composeCoDriverInviteMail>[0], "inviteUrl" | "expiresDays">;
  },
): Promise<{ inviteId: string; token: string }> {
  await tx
    .update(coDriverInvites)
    .set({ closedAt: opts.now })
    .where(
      and(
        eq(coDriverInvites.entryId, opts.entryId),
        isNull(coDriverInvites.closedAt),
        isNull(coDriverInvites.acceptedAt),
      ),
    );
  const token = newInviteToken();
  const inviteId = uuidv7();
  await tx.insert(coDriverInvites).values({
    id: inviteId,
    entryId: opts.entryId,
    email: opts.email,
    tokenHash: hashInviteToken(token),
    invitedBy: opts.invitedBy,
    createdAt: opts.now,
    expiresAt: new Date(opts.now.getTime() + CO_DRIVER_INVITE_DAYS * 86_400_000),
  });
  const mail = composeCoDriverInviteMail({
    ...opts.mail,
    inviteUrl: new URL(`/invites/${token}`, opts.appUrl).toString(),
    expiresDays: CO_DRIVER_INVITE_DAYS,
  });
  await enqueueJobs(
    [
      {
        kind: SEND_MAIL,
        payload: { to: opts.email, ...mail, kind: "co-driver-invite", eventId: opts.eventId },
        dedupeKey: `co-driver-invite:${inviteId}`,
      },
    ],
    tx,
  );
  return { inviteId, token };
}
