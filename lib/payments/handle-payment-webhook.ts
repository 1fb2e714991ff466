import "server-only";
import type Stripe from "stripe";
import { recordWebhookEvent } from "../../db/queries/payments/record-webhook-event";
import { runTransaction } from "../../db/run-transaction";
import { clock } from "../clock";
import { env } from "../env";
import { AppError } from "../errors";
import { markPaymentCancelled } from "./mark-payment-cancelled";
import { markPaymentFailed } from "./mark-payment-failed";
import { markPaymentPaid } from "./mark-payment-paid";
import { PAYMENTS_PROVIDER, paymentsClient } from "./payments-client";

export type WebhookOutcome = "handled" | "duplicate" | "ignored";

/**
 * A webhook delivery from the payments service: its signature checked with the SDK's
 * `webhooks.constructEvent` over the raw bytes (a bad or missing one throws `BadWebhookSignature`
 * and nothing is read or changed), then, in one transaction, the event's id noted (a redelivery
 * stops there) and the payment it names moved on under its row lock, each step only from the
 * states it may follow (one paid mark, one receipt, however often and in whatever order the
 * service delivers).
 */
export async function handlePaymentWebhook({
  body,
  signature,
}: {
  body: Uint8Array;
  signature: string | null;
}): Promise<WebhookOutcome> {
  if (!env.STRIPE_WEBHOOK_SECRET) {
    throw new AppError("unavailable", "Payments are not set up on this server yet.");
  }
  let event: Stripe.Event;
  try {
    event = paymentsClient().webhooks.constructEvent(
      Buffer.from(body),
      signature ?? "",
      env.STRIPE_WEBHOOK_SECRET,
    );
  } catch (error) {
    throw new BadWebhookSignature(error instanceof Error ? error.message : "bad signature");
  }
  return runTransaction(async (tx) => {
    const fresh = await recordWebhookEvent(
      {
        providerEventId: event.id,
        provider: PAYMENTS_PROVIDER,
        type: event.type.slice(0, 80),
        receivedAt: clock.now(),
      },
      tx,
    );
    if (!fresh) return "duplicate";
    switch (event.type) {
      case "checkout.session.completed":
      case "checkout.session.async_payment_succeeded":
        await markPaymentPaid({ session: event.data.object }, tx);
        return "handled";
      case "checkout.session.expired":
        await markPaymentCancelled({ sessionId: event.data.object.id }, tx);
        return "handled";
      case "payment_intent.payment_failed":
        await markPaymentFailed({ intent: event.data.object }, tx);
        return "handled";
      default:
        return "ignored";
    }
  });
}

/** The delivery's signature did not verify: answered 400, nothing changed. */
export class BadWebhookSignature extends Error {
  constructor(message: string) {
    super(message);
    this.name = "BadWebhookSignature";
  }
}
