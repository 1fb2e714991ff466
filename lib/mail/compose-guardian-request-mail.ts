import { renderMail } from "./render-mail";

/**
 * The e-mail a minor's parent or guardian gets: who asked, for which event, and the link that
 * shows the waiver in full and takes their acceptance. Pure.
 */
export function composeGuardianRequestMail(opts: {
  minorName: string;
  guardianName: string;
  eventName: string;
  eventDateText: string;
  carNumber: number;
  url: string;
  linkDays: number;
}) {
  return renderMail({
    subject: `${opts.minorName} asks you to accept the waiver for ${opts.eventName}`,
    heading: `A waiver for ${opts.minorName} needs your acceptance`,
    paragraphs: [
      `Dear ${opts.guardianName},`,
      `${opts.minorName} has entered ${opts.eventName} and is under 18 on the day, so a parent or guardian must accept the event's waiver too before they can sign on.`,
      "The link shows the waiver in full. Read it, and if you agree, accept it by typing your full name. You do not need an account.",
    ],
    details: [
      ["Event", opts.eventName],
      ["Date", opts.eventDateText],
      ["Car", String(opts.carNumber)],
      ["Driver", opts.minorName],
    ],
    action: { label: "Read and accept the waiver", url: opts.url },
    footnote: `The link works once, for ${opts.linkDays} days. If you did not expect this, ignore it: nothing happens without your acceptance.`,
  });
}
