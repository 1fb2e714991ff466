import "server-only";
import { lockEventRow } from "../../db/queries/entries/lock-event-row";
import { markEntryWithdrawn } from "../../db/queries/entries/mark-entry-withdrawn";
import { promoteWaitingEntries } from "../../db/queries/entries/promote-waiting-entries";
import { enqueueJobs } from "../../db/queries/jobs/enqueue-jobs";
import { getEntryPaymentFacts } from "../../db/queries/payments/get-entry-payment-facts";
import { lockPayment } from "../../db/queries/payments/lock-payment";
import { updatePayment } from "../../db/queries/payments/update-payment";
import { runTransaction } from "../../db/run-transaction";
import { clock } from "../clock";
import { refundDue } from "../entries/refund-due";
import { refundPolicySchema } from "../entries/refund-policy-schema";
import { env } from "../env";
import { AppError } from "../errors";
import { SEND_MAIL } from "../jobs/job-kinds";
import { composeRefundMail } from "../mail/compose-refund-mail";
import { closeOpenCheckouts } from "./close-open-checkouts";
import { paymentsClient } from "./payments-client";
import { requireEntryPayer } from "./require-entry-payer";

export type WithdrawOutcome = {
  refundMinor: number;
  currency: string;
  percent: number;
  daysBefore: number;
  promoted: number[];
};

/**
 * Withdraw an entry, by its driver or the car's owner. Under the event's row lock (entering and
 * the waiting list take turns on it) and the entry's: status `withdrawn` with the time; the fee
 * paid refunded per the event's policy through the payments SDK (idempotency key the payment's
 * id, so a transaction run again asks once), the payment `refunded` with the amount; the refund
 * e-mail queued; then the waiting list moves up into the freed place. A refund the service
 * refuses rolls everything back: nothing changes and the person is told. Open checkouts are
 * closed afterwards, so nothing can be paid for a withdrawn entry.
 */
export async function withdrawEntry({
  entryId,
  userId,
}: {
  entryId: string;
  userId: string;
}): Promise<WithdrawOutcome> {
  const first = await getEntryPaymentFacts({ entryId });
  if (!first) throw new AppError("not_found", "No such entry.");
  requireEntryPayer(first, userId);
  const outcome = await runTransaction(async (tx) => {
    const event = await lockEventRow({ eventId: first.eventId }, tx);
    const facts = await getEntryPaymentFacts({ entryId, forUpdate: true }, tx);
    if (!event || !facts) throw new AppError("not_found", "No such entry.");
    if (facts.entryStatus === "withdrawn") {
      throw new AppError("conflict", "This entry is already withdrawn.");
    }
    if (facts.eventStatus === "running" || facts.eventStatus === "finished") {
      throw new AppError("conflict", "The event has started: ask the organizer to withdraw you.");
    }
    const now = clock.now();
    await markEntryWithdrawn({ entryId, withdrawnAt: now }, tx);

    const paidRow = facts.payments.find((p) => p.status === "paid");
    const policy = refundPolicySchema.safeParse(facts.refundPolicy);
    const due = refundDue({
      policy: policy.success ? policy.data : null,
      paidMinor: paidRow?.amountMinor ?? 0,
      eventDate: facts.eventDate,
      timeZone: facts.timeZone,
      withdrawnAt: now,
    });
    let refundRef: string | null = null;
    if (paidRow) {
      const locked = await lockPayment({ id: paidRow.id }, tx);
      if (locked?.status !== "paid" || !locked.paymentRef) {
        throw new AppError("conflict", "The payment changed meanwhile; try again.");
      }
      if (due.amountMinor > 0) {
        const refund = await paymentsClient().refunds.create(
          {
            payment_intent: locked.paymentRef,
            amount: due.amountMinor,
            reason: "requested_by_customer",
            metadata: { entryId, paymentId: locked.id },
          },
          { idempotencyKey: `refund:${locked.id}` },
        );
        refundRef = refund.id;
        await updatePayment(
          { id: locked.id, status: "refunded", refundedMinor: refund.amount, updatedAt: now },
          tx,
        );
      }
      await enqueueJobs(
        [
          {
            kind: SEND_MAIL,
            payload: {
              to: facts.driverEmail,
              ...composeRefundMail({
                eventName: facts.eventName,
                carNumber: facts.carNumber,
                paidMinor: locked.amountMinor,
                refundMinor: due.amountMinor,
                percent: due.percent,
                daysBefore: due.daysBefore,
                currency: locked.currency,
                refundRef,
                entryUrl: new URL(`/entries/${entryId}`, env.APP_URL).toString(),
              }),
              kind: "refund",
              eventId: facts.eventId,
            },
            dedupeKey: `refund:${entryId}`,
          },
        ],
        tx,
      );
    }
    const promoted =
      facts.entryStatus === "entered"
        ? await promoteWaitingEntries(
            { eventId: facts.eventId, capacity: event.capacity, appUrl: env.APP_URL },
            tx,
          )
        : [];
    return {
      refundMinor: paidRow ? due.amountMinor : 0,
      currency: paidRow?.currency ?? facts.currency,
      percent: due.percent,
      daysBefore: due.daysBefore,
      promoted: promoted.map((p) => p.carNumber),
    };
  });
  await closeOpenCheckouts({ entryId }).catch((error: unknown) => {
    console.warn(`[payments] could not close checkouts of withdrawn entry ${entryId}`, error);
  });
  return outcome;
}
