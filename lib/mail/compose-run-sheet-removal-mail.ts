/**
 * The e-mail an entrant gets when a publication takes their car off the run sheet (withdrawn, held,
 * sent back for re-inspection, or moved out by the clerk): it says so, and the caller attaches a
 * calendar file that cancels the sessions the last version gave. Pure.
 */
export function composeRunSheetRemovalMail(opts: {
  carNumber: number;
  eventName: string;
  version: number;
  entryUrl: string;
}) {
  const subject = `Car ${opts.carNumber}: not on run sheet version ${opts.version} — ${opts.eventName}`;
  const body = `Car ${opts.carNumber} is not on run sheet version ${opts.version} for ${opts.eventName}, so it has no session for now. Only cars cleared at the tech line and signed on are put in run groups. Ask the clerk of course if you think this is wrong.`;
  const calendar = "The attached calendar file cancels the sessions the earlier version gave you.";
  const text = [body, "", calendar, `Details: ${opts.entryUrl}`].join("\n");
  const esc = (v: string) => v.replace(/[&<>"']/g, (c) => `&#${c.charCodeAt(0)};`);
  const html = `<!doctype html><html><body style="font-family:sans-serif;font-size:18px;color:#111">
<p>${esc(body)}</p>
<p>${esc(calendar)} <a href="${esc(opts.entryUrl)}">See your entry</a></p>
</body></html>`;
  return { subject, text, html };
}
