import "server-only";
import { eq } from "drizzle-orm";
import type { Tx } from "../../run-transaction";
import { entries } from "../../schema";

/** Withdraw an entry (its row locked by the caller): out of the field and off the waiting list. */
export async function markEntryWithdrawn(
  { entryId, withdrawnAt }: { entryId: string; withdrawnAt: Date },
  tx: Tx,
): Promise<void> {
  await tx
    .update(entries)
    .set({ status: "withdrawn", withdrawnAt, waitingSeq: null, updatedAt: withdrawnAt })
    .where(eq(entries.id, entryId));
}
