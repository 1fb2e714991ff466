import type { EntryDriveSessions } from "../run-sheet/entry-sessions";
import { formatSessionSpan } from "../run-sheet/format-session-span";

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
  const lines = opts.drives.map(
    (d) =>
      `${d.driverName}: ${d.groupName} — ${d.sessions.map((s) => formatSessionSpan(s, opts.timeZone)).join(", ") || "no session fits the day"}`,
  );
  const caution =
    "Times are the venue's local time and can shift on the day; the clerk of course calls each group, and groups are confirmed at the drivers' briefing. The run sheet as published governs.";
  const when = `${opts.dateText}${opts.briefingText ? `; drivers' briefing ${opts.briefingText}` : ""}.`;
  const text = [
    `Run sheet version ${opts.version} for ${opts.eventName}, car ${opts.carNumber}:`,
    when,
    "",
    ...lines,
    ...(opts.changes.length > 0 ? ["", "What changed:", ...opts.changes.map((c) => `- ${c}`)] : []),
    "",
    "Your sessions are attached as a calendar file.",
    `Details: ${opts.entryUrl}`,
    "",
    caution,
  ].join("\n");
  const esc = (v: string) => v.replace(/[&<>"']/g, (c) => `&#${c.charCodeAt(0)};`);
  const html = `<!doctype html><html><body style="font-family:sans-serif;font-size:18px;color:#111">
<p>Run sheet version ${opts.version} for ${esc(opts.eventName)}, car <strong>${opts.carNumber}</strong>: ${esc(when)}</p>
<ul>${lines.map((l) => `<li>${esc(l)}</li>`).join("")}</ul>
${opts.changes.length > 0 ? `<p>What changed:</p><ul>${opts.changes.map((c) => `<li>${esc(c)}</li>`).join("")}</ul>` : ""}
<p>Your sessions are attached as a calendar file. <a href="${esc(opts.entryUrl)}">See your entry</a></p>
<p style="font-size:15px;color:#444">${esc(caution)}</p>
</body></html>`;
  return { subject, text, html };
}
