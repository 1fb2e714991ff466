import "server-only";
import { v7 as uuidv7 } from "uuid";
import { getEntryPaymentFacts } from "../../db/queries/payments/get-entry-payment-facts";
import { insertPayment } from "../../db/queries/payments/insert-payment";
import { runTransaction } from "../../db/run-transaction";
import { clock } from "../clock";
import { env } from "../env";
import { AppError } from "../errors";
import { closeOpenCheckouts } from "./close-open-checkouts";
import { entryPaymentState } from "./entry-payment-state";
import { PAYMENTS_PROVIDER, paymentsClient } from "./payments-client";
import { requireEntryPayer } from "./require-entry-payer";

/**
 * Start paying an entry's fee: a hosted checkout session for the event's fee in its currency
 * (minor units), through the payments SDK, and a `pending` payment row naming it. Any earlier
 * checkout still open is closed first, so one entry never has two that could both be paid.
 * Returns the checkout page's address.
 */
export async function startCheckout({
  entryId,
  userId,
}: {
  entryId: string;
  userId: string;
}): Promise<{ url: string; paymentId: string }> {
  const facts = await getEntryPaymentFacts({ entryId });
  if (!facts) throw new AppError("not_found", "No such entry.");
  requireEntryPayer(facts, userId);
  if (facts.entryStatus === "withdrawn") {
    throw new AppError("conflict", "This entry is withdrawn: there is nothing to pay.");
  }
  if (facts.entryStatus === "waiting") {
    throw new AppError("conflict", "Your entry is on the waiting list: pay once it has a place.");
  }
  if (entryPaymentState(facts.payments).kind === "paid") {
    throw new AppError("conflict", "The entry fee is already paid.");
  }
  await closeOpenCheckouts({ entryId });

  const paymentId = uuidv7();
  const app = env.APP_URL;
  const metadata = { entryId, paymentId };
  const session = await paymentsClient().checkout.sessions.create(
    {
      mode: "payment",
      line_items: [
        {
          quantity: 1,
          price_data: {
            currency: facts.currency.toLowerCase(),
            unit_amount: facts.entryFeeMinor,
            product_data: { name: `Entry fee: ${facts.eventName}, car ${facts.carNumber}` },
          },
        },
      ],
      client_reference_id: entryId,
      customer_email: facts.driverEmail,
      metadata,
      payment_intent_data: { metadata },
      success_url: new URL(`/entries/${entryId}/pay?checkout=done`, app).toString(),
      cancel_url: new URL(`/entries/${entryId}/pay?checkout=back`, app).toString(),
    },
    { idempotencyKey: `checkout:${paymentId}` },
  );
  if (!session.url) throw new AppError("unavailable", "The payment service gave no checkout page.");
  await runTransaction(async (tx) => {
    // Under the entry's lock: a payment that landed meanwhile stops a second one.
    const locked = await getEntryPaymentFacts({ entryId, forUpdate: true }, tx);
    if (!locked || entryPaymentState(locked.payments).kind === "paid") {
      throw new AppError("conflict", "The entry fee is already paid.");
    }
    await insertPayment(
      {
        id: paymentId,
        eventId: facts.eventId,
        entryId,
        provider: PAYMENTS_PROVIDER,
        providerRef: session.id,
        amountMinor: session.amount_total ?? facts.entryFeeMinor,
        currency: (session.currency ?? facts.currency).toUpperCase(),
        createdAt: clock.now(),
      },
      tx,
    );
  });
  return { url: session.url, paymentId };
}
