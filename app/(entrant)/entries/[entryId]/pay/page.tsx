import type { Metadata } from "next";
import Link from "next/link";
import { Caution } from "@/components/caution";
import { PayForm } from "@/components/payments/pay-form";
import { PaymentStatePanel } from "@/components/payments/payment-state-panel";
import { AppError } from "@/lib/errors";
import { formatMoney } from "@/lib/format-money";
import { formatPassTime } from "@/lib/passes/format-pass-time";
import { closeOpenCheckouts } from "@/lib/payments/close-open-checkouts";
import { entryPaymentState } from "@/lib/payments/entry-payment-state";
import { loadEntryPaymentPage } from "@/lib/payments/load-entry-payment-page";
import { formatEventDate } from "@/lib/run-sheet/format-event-date";
import { startCheckoutAction } from "./actions";

export const metadata: Metadata = { title: "Entry fee", robots: { index: false } };

// GET /entries/[entryId]/pay — the entry fee: where it stands and a button to pay it through the
// hosted checkout. Coming back from the checkout without paying (?checkout=back) closes that
// checkout through the payments SDK, so it cannot be paid later by surprise.
export default async function EntryPayPage({
  params,
  searchParams,
}: {
  params: Promise<{ entryId: string }>;
  searchParams: Promise<{ checkout?: string }>;
}) {
  const { entryId } = await params;
  const { checkout } = await searchParams;
  const returnTo = `/entries/${entryId}/pay`;
  let facts = await loadEntryPaymentPage({ entryId, returnTo });
  if (checkout === "back") {
    await closeOpenCheckouts({ entryId }).catch((error: unknown) => {
      if (!(error instanceof AppError)) throw error;
    });
    facts = await loadEntryPaymentPage({ entryId, returnTo });
  }
  const state = entryPaymentState(facts.payments);
  const fee = formatMoney(facts.entryFeeMinor, facts.currency);
  const canPay =
    facts.entryStatus === "entered" &&
    (state.kind === "unpaid" || state.kind === "declined" || state.kind === "cancelled");
  return (
    <div className="mx-auto max-w-md space-y-5">
      <div className="flex items-start gap-3">
        <span className="tabular rounded-lg bg-asphalt-950 px-3 py-2 text-4xl font-bold text-asphalt-50">
          {facts.carNumber}
        </span>
        <div>
          <p className="text-base font-semibold uppercase tracking-wider text-accent">Entry fee</p>
          <h1 className="text-2xl font-bold">{facts.eventName}</h1>
          <p className="text-lg">{formatEventDate(facts.eventDate)}</p>
        </div>
      </div>
      <p className="tabular text-3xl font-bold" data-testid="entry-fee">
        {fee} <span className="text-lg font-semibold text-asphalt-700">{facts.currency}</span>
      </p>
      {facts.entryStatus === "withdrawn" ? (
        <PaymentStatePanel tone="waiting" title="This entry is withdrawn">
          {state.kind === "refunded"
            ? `${formatMoney(state.refundedMinor, state.currency)} of ${formatMoney(state.amountMinor, state.currency)} was refunded.`
            : "Nothing is due."}
        </PaymentStatePanel>
      ) : state.kind === "paid" ? (
        <PaymentStatePanel
          tone="cleared"
          title={`Paid: ${formatMoney(state.amountMinor, state.currency)}`}
        >
          {state.paidAt
            ? `Received ${formatPassTime(Math.floor(state.paidAt.getTime() / 1000), facts.timeZone)}. The receipt is in your e-mail.`
            : "The receipt is in your e-mail."}
        </PaymentStatePanel>
      ) : state.kind === "pending" ? (
        <PaymentStatePanel tone="waiting" title="Waiting for the payment service">
          Your payment is not confirmed yet.{" "}
          <Link href={returnTo} className="underline">
            Check again
          </Link>
        </PaymentStatePanel>
      ) : state.kind === "declined" ? (
        <PaymentStatePanel tone="stopped" title="Card declined: not paid">
          Nothing was taken. The entry fee is still unpaid; try again with another card.
        </PaymentStatePanel>
      ) : state.kind === "cancelled" ? (
        <PaymentStatePanel tone="attention" title="Payment cancelled: not paid">
          You left the checkout before paying. The entry fee is still unpaid.
        </PaymentStatePanel>
      ) : state.kind === "refunded" ? (
        <PaymentStatePanel tone="waiting" title="Refunded">
          {formatMoney(state.refundedMinor, state.currency)} of{" "}
          {formatMoney(state.amountMinor, state.currency)} was refunded.
        </PaymentStatePanel>
      ) : facts.entryStatus === "waiting" ? (
        <PaymentStatePanel tone="waiting" title="On the waiting list">
          You pay once your entry has a place; we e-mail you when it does.
        </PaymentStatePanel>
      ) : (
        <PaymentStatePanel tone="attention" title="Not paid yet" />
      )}
      {canPay ? (
        <PayForm
          entryId={entryId}
          amountText={fee}
          again={state.kind !== "unpaid"}
          action={startCheckoutAction}
        />
      ) : null}
      <p className="text-base text-asphalt-800">
        You pay on the payment service's own page; Plumbline never sees your card.
      </p>
      <div className="flex flex-col gap-3">
        <Link href={`/entries/${entryId}`} className="btn-secondary w-full">
          Back to your entry
        </Link>
        {facts.entryStatus !== "withdrawn" ? (
          <Link href={`/entries/${entryId}/withdraw`} className="btn-secondary w-full">
            Withdraw this entry
          </Link>
        ) : null}
      </div>
      <Caution title="Refunds">
        If you withdraw, the event's refund policy decides what comes back; the organizer's decision
        and the sanctioning body's rules govern.
      </Caution>
    </div>
  );
}
