import "server-only";
import type { Tx } from "../../run-transaction";
import { paymentWebhookEvents } from "../../schema";

/**
 * Note a delivered webhook event by the provider's id, in the transaction that acts on it. False
 * when it was noted before (a redelivery): the caller then changes nothing. A second delivery
 * arriving while the first is still in its transaction waits on the key and then sees it.
 */
export async function recordWebhookEvent(
  row: { providerEventId: string; provider: string; type: string; receivedAt: Date },
  tx: Tx,
): Promise<boolean> {
  try {
    await tx.insert(paymentWebhookEvents).values(row);
    return true;
  } catch (error) {
    if (isDuplicateKey(error)) return false;
    throw error;
  }
}

function isDuplicateKey(error: unknown): boolean {
  for (let e: unknown = error; e; e = (e as { cause?: unknown }).cause) {
    if ((e as { code?: string }).code === "ER_DUP_ENTRY") return true;
  }
  return false;
}
