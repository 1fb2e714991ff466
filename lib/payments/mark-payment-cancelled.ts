import "server-only";
import { lockPayment } from "../../db/queries/payments/lock-payment";
import { updatePayment } from "../../db/queries/payments/update-payment";
import type { Tx } from "../../db/run-transaction";
import { clock } from "../clock";
import { PAYMENTS_PROVIDER } from "./payments-client";

/** A checkout that closed unpaid (expired): its payment (locked) becomes `cancelled`, from
 *  pending only. */
export async function markPaymentCancelled({ sessionId }: { sessionId: string }, tx: Tx) {
  const row = await lockPayment({ provider: PAYMENTS_PROVIDER, providerRef: sessionId }, tx);
  if (row?.status === "pending")
    await updatePayment({ id: row.id, status: "cancelled", updatedAt: clock.now() }, tx);
}
