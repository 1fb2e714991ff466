import { formatMoney } from "../format-money";
import { renderMail } from "./render-mail";

/**
 * The e-mail an entrant gets on withdrawing: their withdrawal, and what the event's refund policy
 * gives back (possibly nothing) and why. Pure.
 */
export function composeRefundMail(opts: {
  eventName: string;
  carNumber: number;
  paidMinor: number;
  refundMinor: number;
  percent: number;
  daysBefore: number;
  currency: string;
  refundRef: string | null;
  entryUrl: string;
}) {
  const paid = formatMoney(opts.paidMinor, opts.currency);
  const back = formatMoney(opts.refundMinor, opts.currency);
  const days = `${opts.daysBefore} ${opts.daysBefore === 1 ? "day" : "days"}`;
  const refundWords =
    opts.refundMinor > 0
      ? `The event's refund policy gives back ${opts.percent}% of the ${paid} you paid for a withdrawal ${days} before the event: ${back} is on its way back to your card. Banks usually take 5–10 working days to show it.`
      : `The event's refund policy gives nothing back for a withdrawal ${days} before the event, so the ${paid} you paid is not refunded.`;
  return renderMail({
    subject:
      opts.refundMinor > 0
        ? `Withdrawn: ${back} refunded — ${opts.eventName}`
        : `Withdrawn: car ${opts.carNumber} — ${opts.eventName}`,
    heading: "Your entry is withdrawn",
    paragraphs: [`Car ${opts.carNumber} is no longer entered in ${opts.eventName}.`, refundWords],
    details: [
      ["Paid", paid],
      ["Refunded", back],
      ...(opts.refundRef
        ? ([["Refund reference", opts.refundRef]] as Array<[string, string]>)
        : []),
    ],
    action: { label: "See your entry", url: opts.entryUrl },
    footnote: "Questions about the refund go to the event's organizer.",
  });
}
