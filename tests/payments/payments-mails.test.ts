import { describe, expect, it } from "vitest";
import { composePaymentReceiptMail } from "@/lib/mail/compose-payment-receipt-mail";
import { composeRefundMail } from "@/lib/mail/compose-refund-mail";
import { composeWaitingListMovedMail } from "@/lib/mail/compose-waiting-list-moved-mail";

// Amounts: GBP has two decimal places, so 8500 minor units are £85.00.
// Source: ISO 4217 (minor unit 2 for GBP); https://docs.stripe.com/currencies#zero-decimal.
describe("payments mails", () => {
  it("the receipt names the amount, the car, the event and the reference, in text and HTML", () => {
    const mail = composePaymentReceiptMail({
      eventName: "Winter <Sprint>",
      eventDate: "2031-06-14",
      carNumber: 41,
      amountMinor: 8500,
      currency: "GBP",
      paymentRef: "pi_123",
      paidAt: "2031-05-01 10:00 UTC",
      entryUrl: "http://127.0.0.1:3000/entries/x",
    });
    expect(mail.subject).toBe("Receipt: entry fee £85.00 paid — Winter <Sprint>");
    expect(mail.text).toContain("Amount: £85.00 (GBP)");
    expect(mail.text).toContain("Payment reference: pi_123");
    expect(mail.html).toContain("Winter &#60;Sprint&#62;");
    expect(mail.html).not.toContain("<Sprint>");
  });

  it("the refund mail says what came back and why, or that nothing did", () => {
    const common = {
      eventName: "Winter Sprint",
      carNumber: 41,
      paidMinor: 8500,
      currency: "GBP",
      entryUrl: "http://x/entries/y",
    };
    const half = composeRefundMail({
      ...common,
      refundMinor: 4250,
      percent: 50,
      daysBefore: 5,
      refundRef: "re_1",
    });
    expect(half.subject).toBe("Withdrawn: £42.50 refunded — Winter Sprint");
    expect(half.text).toContain("gives back 50% of the £85.00 you paid for a withdrawal 5 days");
    const none = composeRefundMail({
      ...common,
      refundMinor: 0,
      percent: 0,
      daysBefore: 1,
      refundRef: null,
    });
    expect(none.subject).toBe("Withdrawn: car 41 — Winter Sprint");
    expect(none.text).toContain("gives nothing back for a withdrawal 1 day before");
  });

  it("the waiting-list mail says the car is entered", () => {
    const mail = composeWaitingListMovedMail({
      eventName: "Winter Sprint",
      eventDate: "2031-06-14",
      carNumber: 72,
      entryUrl: "http://x/entries/z",
    });
    expect(mail.subject).toBe("You're in: car 72 has a place — Winter Sprint");
    expect(mail.text).toContain("http://x/entries/z");
  });
});
