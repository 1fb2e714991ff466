import "server-only";
import { randomUUID } from "node:crypto";
import { enqueueJobs } from "../../db/queries/jobs/enqueue-jobs";
import { listEntryContacts } from "../../db/queries/list-entry-contacts";
import { getLatestRunSheet } from "../../db/queries/run-sheets/get-latest-run-sheet";
import { getRunGroupDraft } from "../../db/queries/run-sheets/get-run-group-draft";
import { insertRunSheet } from "../../db/queries/run-sheets/insert-run-sheet";
import { runTransaction } from "../../db/run-transaction";
import { env } from "../env";
import { AppError } from "../errors";
import { SEND_MAIL, type SendMailPayload } from "../jobs/job-kinds";
import { composeRunSheetMail } from "../mail/compose-run-sheet-mail";
import { buildSchedule } from "../paddock/build-schedule";
import { checkRunGroups } from "../paddock/check-run-groups";
import { changedEntryIds, diffRunSheets, type RunSheetDiff } from "../paddock/diff-run-sheets";
import type { RunSheet } from "../paddock/run-sheet-schema";
import { describeEntryChanges } from "./describe-entry-changes";
import { entrySessions } from "./entry-sessions";
import { eventCap } from "./load-clerk-view";
import { loadEventCars } from "./load-event-cars";
import { publishProblems } from "./publish-problems";
import { runSheetIcs } from "./run-sheet-ics";

/**
 * Publish the clerk of course's draft as the event's next run-sheet version. Refused, with what to
 * do, when the draft is stale, holds a car that is not ready to run, leaves a ready car out, or
 * breaks a blocking rule. Otherwise the sheet (groups, schedule, explanations) is stored immutable
 * and, in the same transaction, every entrant whose group or session times changed is e-mailed
 * with an iCalendar file of their sessions — once per publication, whatever was edited before it.
 */
export async function publishRunSheet({
  eventId,
  revision,
  publishedBy,
  now,
}: {
  eventId: string;
  revision: number;
  publishedBy: string;
  now: Date;
}): Promise<{ version: number; diff: RunSheetDiff; mailed: number; warnings: string[] }> {
  const [{ summary, drives, cars }, draft, previous] = await Promise.all([
    loadEventCars({ eventId }),
    getRunGroupDraft({ eventId }),
    getLatestRunSheet({ eventId }),
  ]);
  if (!draft) throw new AppError("conflict", "Build the run groups before publishing.");
  if (draft.revision !== revision) {
    throw new AppError(
      "conflict",
      "These run groups changed on another screen since you loaded them. Reload, check them, then publish.",
    );
  }
  const problems = publishProblems({
    drives,
    groups: draft.groups,
    carNumbers: new Map(cars.map((c) => [c.entryId, c.carNumber])),
  });
  const placed = drives.filter((d) => draft.groups.some((g) => g.driveIds.includes(d.driveId)));
  const check = checkRunGroups({ drives: placed, capCars: draft.capCars, groups: draft.groups });
  const blocking = check.hard.filter((h) => h.severity === "blocks").map((h) => h.text);
  if (problems.length > 0 || blocking.length > 0) {
    throw new AppError("conflict", `Not published: ${[...problems, ...blocking].join(" ")}`);
  }
  const schedule = buildSchedule({
    eventDate: summary.eventDate,
    timeZone: summary.timeZone,
    settings: draft.settings,
    groupCount: draft.groups.length,
  });
  const body: RunSheet = {
    timeZone: summary.timeZone,
    eventDate: summary.eventDate,
    drives: placed,
    groups: draft.groups,
    settings: draft.settings,
    sessions: schedule.sessions,
    blocks: schedule.blocks,
    explanations: check.explanations,
    gaveWay: [...check.hard, ...check.soft].map(({ rule, driveIds, text }) => ({
      rule,
      driveIds,
      text,
    })),
    cap:
      draft.capCars === eventCap(summary).cars
        ? eventCap(summary)
        : {
            cars: draft.capCars,
            source: `${draft.capCars} cars: set by the clerk of course for this event`,
          },
  };
  const diff = diffRunSheets(previous?.body ?? null, body);
  const toMail = changedEntryIds(diff).filter((id) => body.drives.some((d) => d.entryId === id));
  const contacts = await listEntryContacts({ eventId, entryIds: toMail });
  return runTransaction(async (tx) => {
    const { version } = await insertRunSheet(tx, { eventId, body, publishedBy, publishedAt: now });
    const mails = contacts.flatMap((contact) => {
      const entryUrl = new URL(`/entries/${contact.entryId}`, env.APP_URL).toString();
      const mail = composeRunSheetMail({
        carNumber: contact.carNumber,
        eventName: summary.name,
        version,
        timeZone: summary.timeZone,
        drives: entrySessions(body, contact.entryId),
        changes: previous ? describeEntryChanges(diff, contact.entryId, summary.timeZone) : [],
        entryUrl,
      });
      const ics = runSheetIcs({
        runSheet: body,
        entryId: contact.entryId,
        eventName: summary.name,
        venueName: summary.venueName,
        version,
      });
      const addresses = [contact.driverEmail, contact.coDriverEmail].filter(
        (to, i, all): to is string => !!to && all.indexOf(to) === i,
      );
      return addresses.map((to) => ({
        kind: SEND_MAIL,
        payload: {
          ...mail,
          to,
          kind: "run-sheet",
          eventId,
          messageId: `<${randomUUID()}@${new URL(env.APP_URL).hostname}>`,
          attachments: [
            {
              filename: `car-${contact.carNumber}-sessions.ics`,
              contentType: "text/calendar; charset=utf-8; method=PUBLISH",
              content: ics,
            },
          ],
        } satisfies SendMailPayload,
        dedupeKey: `run-sheet:${eventId}:${version}:${contact.entryId}:${to}`,
      }));
    });
    await enqueueJobs(mails, tx);
    return { version, diff, mailed: mails.length, warnings: schedule.warnings };
  });
}
