import "server-only";
import { AppError } from "../../../lib/errors";
import { runTransaction } from "../../run-transaction";
import { insertCoDriverInvite } from "./insert-co-driver-invite";
import { loadEntryMailContext } from "./load-entry-mail-context";

/**
 * The entrant (the entry's driver) invites a co-driver, or invites again: the older invitation
 * stops working. Refused when the entry has a co-driver already, is withdrawn, or is not theirs.
 */
export async function reinviteCoDriver(opts: {
  entryId: string;
  userId: string;
  email: string;
  now: Date;
  appUrl: string;
}): Promise<void> {
  await runTransaction(async (tx) => {
    const entry = await loadEntryMailContext(tx, { entryId: opts.entryId });
    if (!entry) throw new AppError("not_found", "There is no such entry.");
    if (entry.driverId !== opts.userId) {
      throw new AppError("forbidden", "Only the entry's driver can invite a co-driver.");
    }
    if (entry.status === "withdrawn") {
      throw new AppError("conflict", "This entry was withdrawn.");
    }
    if (entry.coDriverId) {
      throw new AppError("conflict", "This entry has a co-driver already.");
    }
    if (opts.email === entry.driverEmail) {
      throw new AppError("invalid_input", "Your co-driver must be someone else.", {
        coDriverEmail: ["That is your own address: your co-driver must be someone else."],
      });
    }
    await insertCoDriverInvite(tx, {
      entryId: entry.entryId,
      eventId: entry.eventId,
      email: opts.email,
      invitedBy: opts.userId,
      now: opts.now,
      appUrl: opts.appUrl,
      mail: {
        inviterName: entry.driverName ?? entry.driverEmail,
        eventName: entry.eventName,
        eventDay: entry.eventDay,
        carNumber: entry.carNumber,
        car: entry.carWords,
        className: entry.className,
      },
    });
  });
}
