import { renderMail } from "./render-mail";

/**
 * The e-mail a driver on the waiting list gets when a place frees and their entry moves into the
 * field: what is still to do before the day. Pure.
 */
export function composeWaitingListMovedMail(opts: {
  eventName: string;
  eventDate: string;
  carNumber: number;
  entryUrl: string;
}) {
  return renderMail({
    subject: `You're in: car ${opts.carNumber} has a place — ${opts.eventName}`,
    heading: "A place came free: you're entered",
    paragraphs: [
      `Car ${opts.carNumber} has moved up from the waiting list and is now entered in ${opts.eventName} on ${opts.eventDate}.`,
      "Finish what is left on your entry's page (declarations, waiver, entry fee) so your pass is ready for the day.",
    ],
    details: [
      ["Event", `${opts.eventName}, ${opts.eventDate}`],
      ["Car", String(opts.carNumber)],
    ],
    action: { label: "See your entry", url: opts.entryUrl },
    footnote: "You got this because you asked to be put on the event's waiting list.",
  });
}
