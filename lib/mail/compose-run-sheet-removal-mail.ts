import { renderMail } from "./render-mail";

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
  return renderMail({
    subject: `Car ${opts.carNumber}: not on run sheet version ${opts.version} — ${opts.eventName}`,
    heading: `Car ${opts.carNumber} is not on run sheet version ${opts.version} for ${opts.eventName}`,
    paragraphs: [
      "So it has no session for now. Only cars cleared at the tech line and signed on are put in run groups. Ask the clerk of course if you think this is wrong.",
      "The attached calendar file cancels the sessions the earlier version gave you.",
    ],
    action: { label: "See your entry", url: opts.entryUrl },
  });
}
