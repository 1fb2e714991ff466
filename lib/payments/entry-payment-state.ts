/** Where an entry's fee stands, as the pay page and the withdraw page say it. */
export type EntryPaymentState =
  | { kind: "paid"; paymentId: string; amountMinor: number; currency: string; paidAt: Date | null }
  | {
      kind: "refunded";
      paymentId: string;
      amountMinor: number;
      refundedMinor: number;
      currency: string;
    }
  | { kind: "pending"; paymentId: string }
  | { kind: "declined" }
  | { kind: "cancelled" }
  | { kind: "unpaid" };

type PaymentRow = {
  id: string;
  status: "pending" | "paid" | "failed" | "cancelled" | "refunded";
  amountMinor: number;
  currency: string;
  paidAt: Date | null;
  refundedMinor: number;
};

/**
 * The entry's fee state from its payments, newest first: a paid (or refunded) payment wins over
 * any attempt; otherwise the newest attempt says it (declined, cancelled, waiting for the
 * provider), and none is unpaid. Pure.
 */
export function entryPaymentState(paymentsNewestFirst: PaymentRow[]): EntryPaymentState {
  const paid = paymentsNewestFirst.find((p) => p.status === "paid");
  if (paid) {
    return {
      kind: "paid",
      paymentId: paid.id,
      amountMinor: paid.amountMinor,
      currency: paid.currency,
      paidAt: paid.paidAt,
    };
  }
  const refunded = paymentsNewestFirst.find((p) => p.status === "refunded");
  if (refunded) {
    return {
      kind: "refunded",
      paymentId: refunded.id,
      amountMinor: refunded.amountMinor,
      refundedMinor: refunded.refundedMinor,
      currency: refunded.currency,
    };
  }
  const latest = paymentsNewestFirst[0];
  if (!latest) return { kind: "unpaid" };
  if (latest.status === "pending") return { kind: "pending", paymentId: latest.id };
  if (latest.status === "failed") return { kind: "declined" };
  return { kind: "cancelled" };
}
