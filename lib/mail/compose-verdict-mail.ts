import { type VerdictWord, verdictLabels } from "../verdict-word";

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
  const subject = `Car ${opts.carNumber}: ${label}${classPart} — ${opts.eventName}`;
  const text = [
    `Scrutineering result for car ${opts.carNumber} at ${opts.eventName}: ${label}${classPart}.`,
    "",
    opts.reason,
    "",
    `Details: ${opts.entryUrl}`,
    "",
    opts.notice,
  ].join("\n");
  const esc = (v: string) => v.replace(/[&<>"']/g, (c) => `&#${c.charCodeAt(0)};`);
  const html = `<!doctype html><html><body style="font-family:sans-serif;font-size:18px;color:#111">
<p>Scrutineering result for car <strong>${opts.carNumber}</strong> at ${esc(opts.eventName)}: <strong>${esc(label)}${esc(classPart)}</strong>.</p>
<p>${esc(opts.reason)}</p>
<p><a href="${esc(opts.entryUrl)}">See the details</a></p>
<p style="font-size:15px;color:#444">${esc(opts.notice)}</p>
</body></html>`;
  return { subject, text, html };
}
