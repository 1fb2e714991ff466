import "server-only";
import { createHash } from "node:crypto";
import { personName } from "@/lib/auth/person-name";
import { ensureEventPassKey } from "../../db/queries/ensure-event-pass-key";
import { getEventRecordsStamp } from "../../db/queries/get-event-records-stamp";
import { getEventRuleSet } from "../../db/queries/get-event-rule-set";
import { getEventSummary } from "../../db/queries/get-event-summary";
import { getEventVerdictsStamp } from "../../db/queries/get-event-verdicts-stamp";
import { listPendingRecomputes } from "../../db/queries/jobs/list-pending-recomputes";
import { listEventOfficials } from "../../db/queries/list-event-officials";
import { listEventPassKeys } from "../../db/queries/list-event-pass-keys";
import { listEventRecordsSince } from "../../db/queries/list-event-records-since";
import { listEventVerdicts } from "../../db/queries/list-event-verdicts";
import { listPackEntries } from "../../db/queries/list-pack-entries";
import { listRevokedPassIds } from "../../db/queries/list-revoked-pass-ids";
import { AppError } from "../errors";
import type { EventPack } from "../offline/event-pack-schema";

// A record or verdict committed a moment after a pack was read can carry a receive (or compute)
// time just before that pack's time; stepping the cursor back a little re-sends a few of them
// (harmless: the phone merges records by id and verdicts by entry) instead of ever missing one.
// So whatever stamps `received_at` or `computed_at` must commit within this time of stamping.
const CURSOR_SAFETY_MS = 10_000;

/**
 * Everything the tech line needs offline for one event. With `since` (a cursor from an earlier
 * pack), only the records received after it and — when the phone merges verdicts by entry
 * (`partialVerdicts`, pack format 2) — only the verdicts computed after it; the entries and the
 * rule set are left out when the phone says it has them as they are (`phoneHas`: the entries'
 * digest, the rule-set version); the rest (event, officials, pass keys, revoked passes) is small
 * and always whole.
 *
 * The ETag comes first, from the small parts and cheap aggregates of records and verdicts, so a
 * phone whose pack is current gets `pack: null` (→ 304) without a record or verdict being read.
 * The aggregates are read before the records and verdicts, so a pack never holds less than its
 * ETag says: a change landing in between is sent again next time, never skipped.
 */
export async function buildEventPack({
  eventId,
  since,
  partialVerdicts,
  now,
  ifNoneMatch,
  phoneHas = {},
}: {
  eventId: string;
  since: Date | null;
  partialVerdicts: boolean;
  now: Date;
  ifNoneMatch: string | null;
  /** What the phone already holds (from its stored pack): a partial pack leaves out what matches. */
  phoneHas?: { entriesTag?: string; ruleSetVersionId?: string };
}): Promise<{ etag: string; pack: EventPack | null }> {
  const [summary, context] = await Promise.all([
    getEventSummary({ eventId }),
    getEventRuleSet({ eventId }),
  ]);
  if (!summary || !context) throw new AppError("not_found", "No such event.");
  await ensureEventPassKey({ eventId });
  const [
    entries,
    officialRows,
    passKeys,
    revokedPassIds,
    recordsStamp,
    verdictsStamp,
    pendingVerdicts,
  ] = await Promise.all([
    listPackEntries({ eventId }),
    listEventOfficials({ eventId }),
    listEventPassKeys({ eventId }),
    listRevokedPassIds({ eventId }),
    getEventRecordsStamp({ eventId }),
    getEventVerdictsStamp({ eventId }),
    // Before the verdicts are read: see listPendingRecomputes.
    listPendingRecomputes({ eventId }),
  ]);
  const event = {
    id: summary.id,
    name: summary.name,
    eventDate: summary.eventDate,
    timeZone: summary.timeZone,
    unitSystem: summary.unitSystem,
    venueName: summary.venueName,
  };
  // One name per person, however many roles they hold.
  const officials = [
    ...new Map(
      officialRows.map((o) => [o.userId, { userId: o.userId, name: personName(o) }]),
    ).values(),
  ];
  // Rule-set versions are never edited, so the version id stands for the rule set.
  const digest = createHash("sha256")
    .update(
      JSON.stringify({
        event,
        ruleSetVersionId: context.ruleSetVersionId,
        entries,
        officials,
        passKeys,
        revokedPassIds,
        records: recordsStamp,
        verdicts: verdictsStamp,
        pendingVerdicts,
      }),
    )
    .digest("base64url");
  const etag = `"${digest}"`;
  if (ifNoneMatch === etag) return { etag, pack: null };

  const entriesTag = createHash("sha256")
    .update(JSON.stringify(entries))
    .digest("base64url")
    .slice(0, 22);
  // A refresh leaves out the parts the phone already has, unchanged: a day's refreshes then grow
  // with what happened since, not with the size of the event.
  const keptEntries = since !== null && phoneHas.entriesTag === entriesTag;
  const keptRuleSet = since !== null && phoneHas.ruleSetVersionId === context.ruleSetVersionId;
  const [verdicts, records] = await Promise.all([
    listEventVerdicts({ eventId, since: partialVerdicts ? since : null }),
    listEventRecordsSince({ eventId, since }),
  ]);
  return {
    etag,
    pack: {
      packFormat: partialVerdicts ? 2 : 1,
      etag,
      generatedAt: now.toISOString(),
      // This pack's own time, stepped back: everything received or computed before it is here.
      recordsCursor: new Date(now.getTime() - CURSOR_SAFETY_MS).toISOString(),
      partial: since !== null,
      event,
      ruleSet: keptRuleSet ? null : context.ruleSet,
      ruleSetVersionId: context.ruleSetVersionId,
      entries: keptEntries ? [] : entries,
      entriesTag,
      keptEntries,
      keptRuleSet,
      pendingVerdicts,
      officials,
      passKeys,
      revokedPassIds,
      verdicts,
      records,
    },
  };
}
