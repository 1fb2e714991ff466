import "server-only";
import type Stripe from "stripe";
import { enqueueJobs } from "../../db/queries/jobs/enqueue-jobs";
import { getEntryPaymentFacts } from "../../db/queries/payments/get-entry-payment-facts";
import { lockPayment } from "../../db/queries/payments/lock-payment";
import { updatePayment } from "../../db/queries/payments/update-payment";
import type { Tx } from "../../db/run-transaction";
import { clock } from "../clock";
import { enqueuePassReadyMail } from "../entries/enqueue-pass-ready-mail";
import { env } from "../env";
import { formatMoney } from "../format-money";
import { SEND_MAIL } from "../jobs/job-kinds";
import { composePaymentReceiptMail } from "../mail/compose-payment-receipt-mail";
import { formatLocalDateTime } from "../results/format-local-date-time";
import { PAYMENTS_PROVIDER } from "./payments-client";

/**
 * A completed checkout: its payment (locked) becomes `paid` once, with the provider's payment
 * reference and the time, and the receipt is queued in the same transaction (dedupe key the
 * payment's id). A payment already paid or refunded is left as it is.
 */
export async function markPaymentPaid({ session }: { session: Stripe.Checkout.Session }, tx: Tx) {
  if (session.payment_status !== "paid") return;
  const row = await lockPayment({ provider: PAYMENTS_PROVIDER, providerRef: session.id }, tx);
  if (!row || row.status === "paid" || row.status === "refunded") return;
  const paymentRef =
    typeof session.payment_intent === "string"
      ? session.payment_intent
      : (session.payment_intent?.id ?? session.id);
  const paidAt = clock.now();
  await updatePayment({ id: row.id, status: "paid", paymentRef, paidAt, updatedAt: paidAt }, tx);
  const facts = await getEntryPaymentFacts({ entryId: row.entryId }, tx);
  if (!facts) return;
  await enqueueJobs(
    [
      {
        kind: SEND_MAIL,
        payload: {
          to: facts.driverEmail,
          ...composePaymentReceiptMail({
            eventName: facts.eventName,
            eventDate: facts.eventDate,
            carNumber: facts.carNumber,
            amountMinor: row.amountMinor,
            currency: row.currency,
            paymentRef,
            paidAt: formatLocalDateTime(paidAt.toISOString(), facts.timeZone),
            entryUrl: new URL(`/entries/${row.entryId}`, env.APP_URL).toString(),
          }),
          kind: "payment-receipt",
          eventId: row.eventId,
        },
        dedupeKey: `payment-receipt:${row.id}`,
      },
    ],
    tx,
  );
  // Paying may be the last thing the entry needed: then every driver hears the pass is ready.
  await enqueuePassReadyMail({ entryId: row.entryId }, tx);
  console.info(
    `[payments] entry ${row.entryId} paid ${formatMoney(row.amountMinor, row.currency)} (${paymentRef})`,
  );
}
