/** What decides whether a signed-in person may answer a co-driver invitation. */
export type InviteState = {
  expiresAt: Date;
  acceptedAt: Date | null;
  closedAt: Date | null;
  entryStatus: "entered" | "waiting" | "withdrawn";
  driverId: string;
  coDriverId: string | null;
};

/**
 * Why this invitation cannot be accepted by `userId` at `now`, in words; null when it can.
 * The driver cannot co-drive their own car, and an entry has one co-driver at most.
 */
export function inviteProblem(invite: InviteState, userId: string, now: Date): string | null {
  if (invite.acceptedAt) return "This invitation has been accepted already.";
  if (invite.closedAt) {
    return "This invitation is no longer open: it was declined, or the entrant sent a newer one.";
  }
  if (now.getTime() >= invite.expiresAt.getTime()) {
    return "This invitation has expired. Ask the entrant to invite you again.";
  }
  if (invite.entryStatus === "withdrawn") return "This entry was withdrawn.";
  if (invite.driverId === userId) return "You are this car's driver: a co-driver is someone else.";
  if (invite.coDriverId) return "This entry has a co-driver already.";
  return null;
}
