import "server-only";
import { and, eq } from "drizzle-orm";
import type { Tx } from "../../run-transaction";
import { payments } from "../../schema";

/** A payment row, locked for the rest of the transaction, found by our id or by the provider's
 *  checkout reference; null when there is none. */
export async function lockPayment(
  where: { id: string } | { provider: string; providerRef: string },
  tx: Tx,
) {
  const [row] = await tx
    .select({
      id: payments.id,
      eventId: payments.eventId,
      entryId: payments.entryId,
      status: payments.status,
      amountMinor: payments.amountMinor,
      currency: payments.currency,
      paymentRef: payments.paymentRef,
    })
    .from(payments)
    .where(
      "id" in where
        ? eq(payments.id, where.id)
        : and(eq(payments.provider, where.provider), eq(payments.providerRef, where.providerRef)),
    )
    .limit(1)
    .for("update");
  return row ?? null;
}
