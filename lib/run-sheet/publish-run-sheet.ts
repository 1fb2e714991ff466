import "server-only";
import { enqueueJobs } from "../../db/queries/jobs/enqueue-jobs";
import { listEntryContacts } from "../../db/queries/list-entry-contacts";
import { getLatestRunSheet } from "../../db/queries/run-sheets/get-latest-run-sheet";
import { getRunGroupDraft } from "../../db/queries/run-sheets/get-run-group-draft";
import { insertRunSheet } from "../../db/queries/run-sheets/insert-run-sheet";
import { runTransaction } from "../../db/run-transaction";
import { env } from "../env";
import { AppError } from "../errors";
import { buildSchedule } from "../paddock/build-schedule";
import { checkRunGroups } from "../paddock/check-run-groups";
import { changedEntryIds, diffRunSheets, type RunSheetDiff } from "../paddock/diff-run-sheets";
import type { RunSheet } from "../paddock/run-sheet-schema";
import { checkedScheduleSettingsSchema } from "../paddock/schedule-settings";
import { zonedWallTime } from "../paddock/zoned-wall-time";
import { stableStringify } from "../scrutineer/records/stable-stringify";
import { eventCap } from "./load-clerk-view";
import { loadEventCars } from "./load-event-cars";
import { publishProblems } from "./publish-problems";
import { runSheetMailJobs } from "./run-sheet-mail-jobs";

/**
 * Publish the clerk of course's draft as the event's next run-sheet version. Refused, with what to
 * do, when the draft is stale, holds a car that is not ready to run, leaves a ready car out, or
 * breaks a blocking rule. Otherwise the sheet (groups, schedule, explanations) is stored immutable
 * and, in the same transaction, every entrant whose group or session times changed is e-mailed
 * with an iCalendar file of their sessions, and every entrant taken off the sheet is told and sent
 * a file that cancels their sessions — once per publication, whatever was edited before it. Two
 * publishes at once: the second is refused (the version it was diffed against is no longer the
 * latest), so nobody is mailed twice.
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
  const settingsProblems = checkedScheduleSettingsSchema.safeParse(draft.settings);
  if (!settingsProblems.success) {
    throw new AppError(
      "conflict",
      `Not published: ${settingsProblems.error.issues.map((i) => i.message).join(" ")}`,
    );
  }
  const schedule = buildSchedule({
    eventDate: summary.eventDate,
    timeZone: summary.timeZone,
    settings: draft.settings,
    groupCount: draft.groups.length,
  });
  const dayEnds = zonedWallTime({
    date: summary.eventDate,
    time: draft.settings.dayEnd,
    timeZone: summary.timeZone,
  }).utcMs;
  if (schedule.sessions.some((s) => Date.parse(s.endsAt) > dayEnds)) {
    throw new AppError(
      "conflict",
      `Not published: sessions would run past the end of the day (${draft.settings.dayEnd}). Choose fewer rounds or "as many as fit", or a later end. ${schedule.warnings.join(" ")}`.trim(),
    );
  }
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
  if (previous && stableStringify(previous.body) === stableStringify(body)) {
    throw new AppError(
      "conflict",
      `Nothing has changed since version ${previous.version} was published: there is nothing new to publish.`,
    );
  }
  const diff = diffRunSheets(previous?.body ?? null, body);
  const toMail = changedEntryIds(diff);
  const contacts = await listEntryContacts({ eventId, entryIds: toMail });
  return runTransaction(async (tx) => {
    const { id: publicationId, version } = await insertRunSheet(tx, {
      eventId,
      body,
      publishedBy,
      publishedAt: now,
      previousVersion: previous?.version ?? null,
    });
    const mails = runSheetMailJobs({
      eventId,
      publicationId,
      eventName: summary.name,
      venueName: summary.venueName,
      timeZone: summary.timeZone,
      version,
      sheet: body,
      previous: previous?.body ?? null,
      diff,
      contacts,
      appUrl: env.APP_URL,
    });
    await enqueueJobs(mails, tx);
    return { version, diff, mailed: mails.length, warnings: schedule.warnings };
  });
}
