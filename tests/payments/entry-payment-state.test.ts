import { describe, expect, it } from "vitest";
import { entryPaymentState } from "@/lib/payments/entry-payment-state";

const row = (status: "pending" | "paid" | "failed" | "cancelled" | "refunded", id = status) => ({
  id,
  status,
  amountMinor: 8500,
  currency: "GBP",
  paidAt: null,
  refundedMinor: status === "refunded" ? 4250 : 0,
});

// Our own rule (no outside source): a payment that went through outranks any later attempt.
describe("entryPaymentState", () => {
  it("none is unpaid; the newest attempt speaks when nothing is paid", () => {
    expect(entryPaymentState([]).kind).toBe("unpaid");
    expect(entryPaymentState([row("failed"), row("cancelled")]).kind).toBe("declined");
    expect(entryPaymentState([row("cancelled"), row("failed")]).kind).toBe("cancelled");
    expect(entryPaymentState([row("pending"), row("failed")]).kind).toBe("pending");
  });
  it("a paid payment wins over any attempt, then a refunded one", () => {
    expect(entryPaymentState([row("failed"), row("paid")]).kind).toBe("paid");
    expect(entryPaymentState([row("cancelled"), row("refunded")])).toMatchObject({
      kind: "refunded",
      refundedMinor: 4250,
    });
  });
});
