import type { EntryDriveSessions } from "../run-sheet/entry-sessions";
import { formatSessionSpan } from "../run-sheet/format-session-span";
import { renderMail } from "./render-mail";

/**
 * The e-mail an entrant gets when a published run sheet puts their car in a group or changes its
 * group or times: each driver's group and sessions in the venue's time, what changed, and the
 * calendar file attached by the caller. Pure.
 */
export function composeRunSheetMail(opts: {
  carNumber: number;
  eventName: string;
  version: number;
  timeZone: string;
  /** The event's date for people ("Sat 12 Jun 2027") and the briefing's time, if there is one. */
  dateText: string;
  briefingText: string | null;
  drives: EntryDriveSessions[];
  /** What changed for this car since the last version, in words (empty for the first). */
  changes: string[];
  entryUrl: string;
}) {
  const subject = `Car ${opts.carNumber}: run sheet ${opts.version === 1 ? "published" : `updated (version ${opts.version})`} — ${opts.eventName}`;
  const when = `${opts.dateText}${opts.briefingText ? `; drivers' briefing ${opts.briefingText}` : ""}.`;
  return renderMail({
    subject,
    heading: `Run sheet version ${opts.version} for ${opts.eventName}, car ${opts.carNumber}`,
    paragraphs: [
      when,
      ...(opts.changes.length > 0 ? [`What changed: ${opts.changes.join(" ")}`] : []),
      "Your sessions are attached as a calendar file.",
    ],
    details: opts.drives.map((d) => [
      d.driverName,
      `${d.groupName} — ${d.sessions.map((s) => formatSessionSpan(s, opts.timeZone)).join(", ") || "no session fits the day"}`,
    ]),
    action: { label: "See your entry", url: opts.entryUrl },
    footnote:
      "Times are the venue's local time and can shift on the day; the clerk of course calls each group, and groups are confirmed at the drivers' briefing. The run sheet as published governs.",
  });
}
