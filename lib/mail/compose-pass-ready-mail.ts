import { renderMail } from "./render-mail";

/** The e-mail each driver gets once their entry is signed on (waivers complete, fee paid). Pure. */
export function composePassReadyMail(opts: {
  driverName: string;
  eventName: string;
  eventDateText: string;
  carNumber: number;
  passUrl: string;
}) {
  return renderMail({
    subject: `Your pass for ${opts.eventName} is ready — car ${opts.carNumber}`,
    heading: "You are signed on: your pass is ready",
    paragraphs: [
      `Hello ${opts.driverName},`,
      `Every driver of car ${opts.carNumber} has accepted the waiver and the entry fee is paid, so the entry is signed on for ${opts.eventName}.`,
      "Open the pass once on your phone before you travel: it then works with no signal. Show it at the tech line, where the car is scrutineered before it may run.",
    ],
    details: [
      ["Event", opts.eventName],
      ["Date", opts.eventDateText],
      ["Car", String(opts.carNumber)],
    ],
    action: { label: "Open my pass", url: opts.passUrl },
    footnote:
      "A pass identifies the entry; it is not a safety clearance. The chief scrutineer has the final say on the day.",
  });
}
