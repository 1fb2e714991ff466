import type { Metadata } from "next";
import Link from "next/link";
import { Caution } from "@/components/caution";
import { PaymentStatePanel } from "@/components/payments/payment-state-panel";
import { WithdrawForm } from "@/components/payments/withdraw-form";
import { clock } from "@/lib/clock";
import { refundDue } from "@/lib/entries/refund-due";
import { refundPolicySchema } from "@/lib/entries/refund-policy-schema";
import { formatMoney } from "@/lib/format-money";
import { entryPaymentState } from "@/lib/payments/entry-payment-state";
import { loadEntryPaymentPage } from "@/lib/payments/load-entry-payment-page";
import { formatEventDate } from "@/lib/run-sheet/format-event-date";
import { withdrawEntryAction } from "./actions";

export const metadata: Metadata = { title: "Withdraw", robots: { index: false } };

// GET /entries/[entryId]/withdraw — withdraw an entry: the event's refund policy in words, what
// it gives back today, and the button.
export default async function EntryWithdrawPage({
  params,
}: {
  params: Promise<{ entryId: string }>;
}) {
  const { entryId } = await params;
  const facts = await loadEntryPaymentPage({ entryId, returnTo: `/entries/${entryId}/withdraw` });
  const state = entryPaymentState(facts.payments);
  const parsed = refundPolicySchema.safeParse(facts.refundPolicy);
  const policy = parsed.success ? parsed.data : null;
  const paidMinor = state.kind === "paid" ? state.amountMinor : 0;
  const due = refundDue({
    policy,
    paidMinor,
    eventDate: facts.eventDate,
    timeZone: facts.timeZone,
    withdrawnAt: clock.now(),
  });
  const tiers = [...(policy?.tiers ?? [])].sort((a, b) => b.daysBefore - a.daysBefore);
  return (
    <div className="mx-auto max-w-md space-y-5">
      <div className="flex items-start gap-3">
        <span className="tabular rounded-lg bg-asphalt-950 px-3 py-2 text-4xl font-bold text-asphalt-50">
          {facts.carNumber}
        </span>
        <div>
          <p className="text-base font-semibold uppercase tracking-wider text-accent">Withdraw</p>
          <h1 className="text-2xl font-bold">{facts.eventName}</h1>
          <p className="text-lg">{formatEventDate(facts.eventDate)}</p>
        </div>
      </div>
      <section className="card space-y-2" aria-label="Refund policy">
        <h2 className="text-xl font-bold">The event's refund policy</h2>
        {tiers.length > 0 ? (
          <ul className="list-disc space-y-1 pl-5 text-lg">
            {tiers.map((t) => (
              <li key={t.daysBefore}>
                {t.percent}% back when you withdraw {t.daysBefore} or more days before the event
              </li>
            ))}
            <li>Nothing back after that</li>
          </ul>
        ) : (
          <p className="text-lg">No refunds for this event.</p>
        )}
        <p className="text-base text-asphalt-800">
          Days are counted between calendar dates at the venue ({facts.timeZone}).
        </p>
      </section>
      {facts.entryStatus === "withdrawn" ? (
        <PaymentStatePanel tone="waiting" title={`Car ${facts.carNumber} is withdrawn`}>
          {state.kind === "refunded"
            ? `${formatMoney(state.refundedMinor, state.currency)} was refunded.`
            : "No refund was due."}
        </PaymentStatePanel>
      ) : (
        <>
          <PaymentStatePanel
            tone={paidMinor > 0 ? (due.amountMinor > 0 ? "cleared" : "attention") : "waiting"}
            title={
              paidMinor > 0
                ? `Withdraw today: ${formatMoney(due.amountMinor, facts.currency)} back`
                : "Nothing was paid, so nothing comes back"
            }
          >
            {paidMinor > 0
              ? `${due.daysBefore} days before the event: ${due.percent}% of the ${formatMoney(paidMinor, facts.currency)} you paid.`
              : facts.entryStatus === "waiting"
                ? "You leave the waiting list."
                : "Your place goes to the waiting list."}
          </PaymentStatePanel>
          <WithdrawForm
            entryId={entryId}
            carNumber={facts.carNumber}
            action={withdrawEntryAction}
          />
        </>
      )}
      <Link href={`/entries/${entryId}`} className="btn-secondary w-full">
        Back to your entry
      </Link>
      <Caution title="Refunds">
        A refund takes some days to reach your card. The organizer and the sanctioning body's rules
        have the final say on entries and refunds.
      </Caution>
    </div>
  );
}
