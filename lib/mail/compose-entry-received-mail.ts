import { renderMail } from "./render-mail";

/**
 * The e-mail an entrant gets when their entry is taken: in the field with its car number, or on
 * the waiting list with its place. Pure.
 */
export function composeEntryReceivedMail(opts: {
  eventName: string;
  eventDay: string;
  carNumber: number;
  car: string;
  className: string;
  status: "entered" | "waiting";
  /** Place on the waiting list (1 = next to move up); only when waiting. */
  waitingPlace: number | null;
  fee: string;
  entryUrl: string;
}) {
  const waiting = opts.status === "waiting";
  const subject = waiting
    ? `Waiting list, place ${opts.waitingPlace}: ${opts.eventName}`
    : `Entry received: car ${opts.carNumber} at ${opts.eventName}`;
  const paragraphs = waiting
    ? [
        `The field for ${opts.eventName} is full, so your ${opts.car} is on the waiting list in place ${opts.waitingPlace}.`,
        "When someone withdraws, the waiting list moves up in order and we e-mail you when a place is yours. Until then you need not pay.",
      ]
    : [
        `Your ${opts.car} is entered in ${opts.eventName} as car ${opts.carNumber}.`,
        "Next: declare the car for its class, sign the waiver and pay the entry fee. Your entry page lists each step.",
      ];
  return renderMail({
    subject,
    heading: waiting ? "You are on the waiting list" : "Your entry is in",
    paragraphs,
    details: [
      ["Event", `${opts.eventName}, ${opts.eventDay}`],
      ["Car", `${opts.carNumber} · ${opts.car}`],
      ["Class", opts.className],
      ["Entry fee", opts.fee],
      ...(waiting ? [["Waiting list place", String(opts.waitingPlace)] as [string, string]] : []),
    ],
    action: { label: "Open your entry", url: opts.entryUrl },
    footnote: "You get this e-mail because you entered this event on Plumbline.",
  });
}
