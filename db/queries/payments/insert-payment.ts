import "server-only";
import type { Tx } from "../../run-transaction";
import { payments } from "../../schema";

/** A new payment, pending until the provider's webhook says how it went. */
export async function insertPayment(
  row: {
    id: string;
    eventId: string;
    entryId: string;
    provider: string;
    providerRef: string;
    amountMinor: number;
    currency: string;
    createdAt: Date;
  },
  tx: Tx,
): Promise<void> {
  await tx.insert(payments).values({ ...row, status: "pending", updatedAt: row.createdAt });
}
