import { randomUUID } from "node:crypto";
import type { NewJob } from "../../db/queries/jobs/enqueue-jobs";
import { SEND_MAIL, type SendMailPayload } from "../jobs/job-kinds";
import { composeRunSheetMail } from "../mail/compose-run-sheet-mail";
import { composeRunSheetRemovalMail } from "../mail/compose-run-sheet-removal-mail";
import type { RunSheetDiff } from "../paddock/diff-run-sheets";
import type { RunSheet } from "../paddock/run-sheet-schema";
import { describeEntryChanges } from "./describe-entry-changes";
import { entrySessions } from "./entry-sessions";
import { formatEventDate } from "./format-event-date";
import { formatSessionSpan } from "./format-session-span";
import { runSheetIcs } from "./run-sheet-ics";

type Contact = {
  entryId: string;
  carNumber: number;
  driverEmail: string | null;
  coDriverEmail: string | null;
};

/**
 * The e-mail jobs of one publication: for each entry it changes (the caller passes their
 * contacts), one per address — the group and times with a calendar file, or, for a car no longer on
 * the sheet, a notice with a file that cancels its earlier sessions. Keyed by publication, entry
 * and address, so the same publication never mails anyone twice.
 */
export function runSheetMailJobs(args: {
  eventId: string;
  /** The publication's own id: the e-mails' dedupe keys name it. */
  publicationId: string;
  eventName: string;
  venueName: string;
  timeZone: string;
  version: number;
  sheet: RunSheet;
  previous: RunSheet | null;
  diff: RunSheetDiff;
  contacts: Contact[];
  appUrl: string;
}): NewJob[] {
  const { sheet, previous, version } = args;
  const host = new URL(args.appUrl).hostname;
  const briefing = sheet.blocks.find((b) => b.kind === "briefing");
  return args.contacts.flatMap((contact) => {
    const entryUrl = new URL(`/entries/${contact.entryId}`, args.appUrl).toString();
    const onSheet = sheet.drives.some((d) => d.entryId === contact.entryId);
    if (!onSheet && !previous?.drives.some((d) => d.entryId === contact.entryId)) return [];
    const calendar = {
      entryId: contact.entryId,
      eventName: args.eventName,
      venueName: args.venueName,
      version,
    };
    const mail = onSheet
      ? composeRunSheetMail({
          carNumber: contact.carNumber,
          eventName: args.eventName,
          version,
          timeZone: args.timeZone,
          dateText: formatEventDate(sheet.eventDate),
          briefingText: briefing ? formatSessionSpan(briefing, args.timeZone) : null,
          drives: entrySessions(sheet, contact.entryId),
          changes: previous
            ? describeEntryChanges(
                args.diff,
                contact.entryId,
                args.timeZone,
                entrySessions(sheet, contact.entryId).map((d) => d.groupName),
              )
            : [],
          entryUrl,
        })
      : composeRunSheetRemovalMail({
          carNumber: contact.carNumber,
          eventName: args.eventName,
          version,
          entryUrl,
        });
    const ics = onSheet
      ? runSheetIcs({ ...calendar, runSheet: sheet })
      : runSheetIcs({ ...calendar, runSheet: previous as RunSheet, cancelled: true });
    const addresses = [contact.driverEmail, contact.coDriverEmail].filter(
      (to, i, all): to is string => !!to && all.indexOf(to) === i,
    );
    return addresses.map((to) => ({
      kind: SEND_MAIL,
      payload: {
        ...mail,
        to,
        kind: "run-sheet",
        eventId: args.eventId,
        messageId: `<${randomUUID()}@${host}>`,
        attachments: [
          {
            filename: `car-${contact.carNumber}-sessions.ics`,
            contentType: `text/calendar; charset=utf-8; method=${onSheet ? "PUBLISH" : "CANCEL"}`,
            content: ics,
          },
        ],
      } satisfies SendMailPayload,
      dedupeKey: `run-sheet:${args.publicationId}:${contact.entryId}:${to}`,
    }));
  });
}
