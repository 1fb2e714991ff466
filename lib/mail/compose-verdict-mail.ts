import { type VerdictWord, verdictLabels } from "../verdict-word";
import { renderMail } from "./render-mail";

/** The e-mail an entrant gets when the tech line's verdict on their car changes. Pure. */
export function composeVerdictMail(opts: {
  carNumber: number;
  eventName: string;
  status: VerdictWord;
  className: string | null;
  reason: string;
  entryUrl: string;
  notice: string;
}) {
  const label = verdictLabels[opts.status];
  const classPart = opts.className ? ` (${opts.className})` : "";
  return renderMail({
    subject: `Car ${opts.carNumber}: ${label}${classPart} — ${opts.eventName}`,
    heading: `Scrutineering result for car ${opts.carNumber} at ${opts.eventName}: ${label}${classPart}.`,
    paragraphs: [opts.reason],
    action: { label: "See the details", url: opts.entryUrl },
    footnote: opts.notice,
  });
}
