import "server-only";
import { createHash } from "node:crypto";
import { ensureEventPassKey } from "../../db/queries/ensure-event-pass-key";
import { getEventRuleSet } from "../../db/queries/get-event-rule-set";
import { getEventSummary } from "../../db/queries/get-event-summary";
import { listEventOfficials } from "../../db/queries/list-event-officials";
import { listEventPassKeys } from "../../db/queries/list-event-pass-keys";
import { listEventRecordsSince } from "../../db/queries/list-event-records-since";
import { listEventVerdicts } from "../../db/queries/list-event-verdicts";
import { listPackEntries } from "../../db/queries/list-pack-entries";
import { listRevokedPassIds } from "../../db/queries/list-revoked-pass-ids";
import { AppError } from "../errors";
import type { EventPack } from "../offline/event-pack-schema";

// A record committed a moment after a pack was read can carry a receive time just before the
// cursor; stepping the cursor back a little re-sends a few records (harmless: merging is a union)
// instead of ever missing one.
const CURSOR_SAFETY_MS = 10_000;

/**
 * Everything the tech line needs offline for one event. With `since`, only records received
 * after it (a partial pack the phone merges). The ETag covers the whole pack's content.
 */
export async function buildEventPack({
  eventId,
  since,
  now,
}: {
  eventId: string;
  since: Date | null;
  now: Date;
}): Promise<EventPack> {
  const [summary, context] = await Promise.all([
    getEventSummary({ eventId }),
    getEventRuleSet({ eventId }),
  ]);
  if (!summary || !context) throw new AppError("not_found", "No such event.");
  await ensureEventPassKey({ eventId });
  const [entries, officials, passKeys, revokedPassIds, verdicts, allRecords] = await Promise.all([
    listPackEntries({ eventId }),
    listEventOfficials({ eventId }),
    listEventPassKeys({ eventId }),
    listRevokedPassIds({ eventId }),
    listEventVerdicts({ eventId }),
    listEventRecordsSince({ eventId, since: null }),
  ]);
  const last = allRecords.at(-1)?.receivedAt ?? null;
  // The cursor is this pack's own time, stepped back: everything received before then is in it.
  const recordsCursor = new Date(now.getTime() - CURSOR_SAFETY_MS).toISOString();
  const records = since
    ? allRecords.filter((r) => Date.parse(r.receivedAt) > since.getTime())
    : allRecords;
  const etag = createHash("sha256")
    .update(
      JSON.stringify({
        v: context.ruleSetVersionId,
        entries,
        keys: passKeys,
        revokedPassIds,
        verdicts: verdicts.map((v) => [v.entryId, v.status, v.classId, v.computedAt]),
        records: [allRecords.length, last],
        officials: officials.map((o) => o.userId),
      }),
    )
    .digest("base64url");
  return {
    packFormat: 1,
    etag: `"${etag}"`,
    generatedAt: now.toISOString(),
    recordsCursor,
    partial: since !== null,
    event: {
      id: summary.id,
      name: summary.name,
      eventDate: summary.eventDate,
      timeZone: summary.timeZone,
      unitSystem: summary.unitSystem,
      venueName: summary.venueName,
    },
    ruleSet: context.ruleSet,
    ruleSetVersionId: context.ruleSetVersionId,
    entries,
    officials: [
      ...new Map(
        officials.map((o) => [o.userId, { userId: o.userId, name: o.name ?? o.email }]),
      ).values(),
    ],
    passKeys,
    revokedPassIds,
    verdicts,
    records,
  };
}
