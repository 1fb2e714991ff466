import "server-only";
import { getEntryPaymentFacts } from "../../db/queries/payments/get-entry-payment-facts";
import { lockPayment } from "../../db/queries/payments/lock-payment";
import { updatePayment } from "../../db/queries/payments/update-payment";
import { runTransaction } from "../../db/run-transaction";
import { clock } from "../clock";
import { AppError } from "../errors";
import { paymentsClient } from "./payments-client";

/**
 * Close every checkout of an entry that could still be paid: each `pending` (or declined, whose
 * session stays open for another card) payment's session is asked for through the SDK and, when
 * still open, expired; a pending one then becomes `cancelled` (under its row lock, only from
 * pending, so a payment confirmed meanwhile stays paid). A session already complete means its
 * payment is on its way: that is said, not hidden.
 */
export async function closeOpenCheckouts({ entryId }: { entryId: string }): Promise<void> {
  const facts = await getEntryPaymentFacts({ entryId });
  if (!facts) return;
  const client = paymentsClient();
  for (const p of facts.payments) {
    if (p.status !== "pending" && p.status !== "failed") continue;
    const session = await client.checkout.sessions.retrieve(p.providerRef);
    if (session.status === "complete") {
      if (p.status === "failed") continue;
      throw new AppError(
        "conflict",
        "Your last payment went through; the payment service is still confirming it. Reload in a moment.",
      );
    }
    if (session.status === "open") await client.checkout.sessions.expire(p.providerRef);
    if (p.status !== "pending") continue;
    await runTransaction(async (tx) => {
      const row = await lockPayment({ id: p.id }, tx);
      if (row?.status === "pending")
        await updatePayment({ id: p.id, status: "cancelled", updatedAt: clock.now() }, tx);
    });
  }
}
