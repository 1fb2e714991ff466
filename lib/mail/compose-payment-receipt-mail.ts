import { formatMoney } from "../format-money";
import { renderMail } from "./render-mail";

/**
 * The receipt an entrant gets once the entry fee is paid: what was paid, for which event and car,
 * and the payment's reference. Pure.
 */
export function composePaymentReceiptMail(opts: {
  eventName: string;
  eventDate: string;
  carNumber: number;
  amountMinor: number;
  currency: string;
  paymentRef: string;
  paidAt: string;
  entryUrl: string;
}) {
  const amount = formatMoney(opts.amountMinor, opts.currency);
  return renderMail({
    subject: `Receipt: entry fee ${amount} paid — ${opts.eventName}`,
    heading: "Entry fee paid",
    paragraphs: [
      `Thank you: we have your entry fee of ${amount} for car ${opts.carNumber} at ${opts.eventName}.`,
      "Your pass is ready once every driver's waiver is signed too; your entry's page shows what is left.",
    ],
    details: [
      ["Event", `${opts.eventName}, ${opts.eventDate}`],
      ["Car", String(opts.carNumber)],
      ["Amount", `${amount} (${opts.currency})`],
      ["Paid", opts.paidAt],
      ["Payment reference", opts.paymentRef],
    ],
    action: { label: "See your entry", url: opts.entryUrl },
    footnote:
      "Keep this e-mail as your receipt. If you withdraw, the event's refund policy applies.",
  });
}
