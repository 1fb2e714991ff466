import "server-only";
import type Stripe from "stripe";
import { lockPayment } from "../../db/queries/payments/lock-payment";
import { updatePayment } from "../../db/queries/payments/update-payment";
import type { Tx } from "../../db/run-transaction";
import { clock } from "../clock";

/** A declined card: the payment the intent's metadata names (locked) becomes `failed`, from
 *  pending only; the entry stays unpaid. */
export async function markPaymentFailed({ intent }: { intent: Stripe.PaymentIntent }, tx: Tx) {
  const paymentId = intent.metadata?.paymentId;
  if (!paymentId) return;
  const row = await lockPayment({ id: paymentId }, tx);
  if (row?.status === "pending")
    await updatePayment({ id: row.id, status: "failed", updatedAt: clock.now() }, tx);
}
