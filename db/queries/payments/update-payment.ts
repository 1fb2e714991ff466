import "server-only";
import { eq } from "drizzle-orm";
import type { Tx } from "../../run-transaction";
import { payments } from "../../schema";

/** Change a (locked) payment's state and what comes with it. */
export async function updatePayment(
  {
    id,
    ...set
  }: {
    id: string;
    status: "pending" | "paid" | "failed" | "cancelled" | "refunded";
    paymentRef?: string;
    paidAt?: Date;
    refundedMinor?: number;
    updatedAt: Date;
  },
  tx: Tx,
): Promise<void> {
  await tx.update(payments).set(set).where(eq(payments.id, id));
}
