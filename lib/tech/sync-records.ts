import "server-only";
import { countEntryVoids } from "../../db/queries/count-entry-voids";
import { insertRecords } from "../../db/queries/insert-records";
import { enqueueJobs } from "../../db/queries/jobs/enqueue-jobs";
import { listEventEntryIds } from "../../db/queries/list-event-entry-ids";
import { listRecordAuthors } from "../../db/queries/list-record-authors";
import { runTransaction } from "../../db/run-transaction";
import type { SessionUser } from "../auth/get-session-user";
import type { Role } from "../auth/roles";
import { clock } from "../clock";
import { faultPoint } from "../jobs/fault-point";
import { RECOMPUTE_VERDICTS } from "../jobs/job-kinds";
import { MAX_VOIDS_PER_ENTRY } from "../scrutineer/records/max-voids-per-entry";
import { incomingRecordSchema, type TechRecord } from "../scrutineer/records/record-schema";
import { describeRecordIssue } from "./describe-record-issue";
import { deviceTimeProblem } from "./device-time-problem";
import { recordRefusal } from "./record-refusal";
import type { SyncRecordResult, SyncResponse } from "./sync-schema";

/**
 * Accept a batch from a phone's outbox: check every record on its own (shape, who made it, the
 * permission for its kind and, for a void, whose record it voids; that its entry is in this
 * event), then in one transaction store the good ones idempotently and enqueue the re-derivation
 * of the verdicts of the entries they touch (the worker does it, and e-mails what changed), and
 * answer per record with the entries whose verdict is on its way. A bad record never stops the
 * good ones; nothing is silently dropped. Refusals are worded for the scrutineer.
 */
export async function syncRecords({
  eventId,
  user,
  roles,
  rawRecords,
  now,
}: {
  eventId: string;
  user: SessionUser;
  roles: Role[];
  rawRecords: unknown[];
  now: Date;
}): Promise<SyncResponse> {
  // No "does the event exist" read: the route's guard found the caller's role in this event.

  const results: SyncRecordResult[] = new Array(rawRecords.length);
  const parsed = rawRecords.map((raw) => incomingRecordSchema.safeParse(raw));
  // A scrutineer may void their own records: look up who made each record a void names.
  const authors = await listRecordAuthors({
    eventId,
    recordIds: [
      ...new Set(
        parsed.flatMap((p) =>
          p.success && p.data.kind === "void" ? [p.data.payload.targetRecordId] : [],
        ),
      ),
    ],
  });
  const candidates: { index: number; record: TechRecord }[] = [];
  parsed.forEach((result, index) => {
    const raw = rawRecords[index];
    const id =
      typeof (raw as { id?: unknown })?.id === "string" ? (raw as { id: string }).id : null;
    if (!result.success) {
      results[index] = {
        id,
        status: "refused",
        reason: describeRecordIssue(result.error.issues[0], raw),
      };
      return;
    }
    const record = result.data;
    const lateClock = deviceTimeProblem(record.deviceTime, now);
    if (lateClock !== null) {
      results[index] = { id, status: "refused", reason: lateClock };
      return;
    }
    // A void's target: stored already, or accepted earlier in this batch (the outbox sends
    // oldest first, so a reading and the void of it can travel together).
    const target =
      record.kind === "void"
        ? (authors.get(record.payload.targetRecordId) ??
          candidates.find((c) => c.record.id === record.payload.targetRecordId)?.record ??
          null)
        : null;
    const refusal = recordRefusal({ record, userId: user.id, roles, target });
    if (refusal !== null) results[index] = { id, status: "refused", reason: refusal };
    else candidates.push({ index, record });
  });

  const known = await listEventEntryIds({
    eventId,
    entryIds: [...new Set(candidates.map((c) => c.record.entryId))],
  });
  const candidateVoids = candidates.filter((c) => c.record.kind === "void");
  // A void sent again (a retry after a lost answer) is already counted: never refuse it.
  const storedVoids = await listRecordAuthors({
    eventId,
    recordIds: candidateVoids.map((c) => c.record.id),
  });
  const voids = await countEntryVoids({
    eventId,
    entryIds: [
      ...new Set(candidates.filter((c) => c.record.kind === "void").map((c) => c.record.entryId)),
    ],
  });
  const accepted = candidates.filter(({ index, record }) => {
    if (!known.has(record.entryId)) {
      results[index] = {
        id: record.id,
        status: "refused",
        reason: "That car is not entered in this event.",
      };
      return false;
    }
    if (record.kind !== "void" || storedVoids.has(record.id)) return true;
    // Counted with this batch's earlier voids. Two batches for one car at the same moment may
    // each pass the count (it is not locked): the bound can be passed by one batch at most.
    const already = voids.get(record.entryId) ?? 0;
    if (already >= MAX_VOIDS_PER_ENTRY) {
      results[index] = {
        id: record.id,
        status: "refused",
        reason: `This car already has ${MAX_VOIDS_PER_ENTRY} voids, the most one car may have. Ask the chief scrutineer to look over its records.`,
      };
      return false;
    }
    voids.set(record.entryId, already + 1);
    return true;
  });

  const batch = accepted.map((a) => a.record);
  // The receive time is stamped on each attempt of the transaction (a retried one is later):
  // a phone's partial pack finds records by it, a little behind the pack's own time.
  let receivedAt = now;
  const outcomes = await runTransaction(async (tx) => {
    receivedAt = laterOf(now, clock.now());
    const stored = await insertRecords({ tx, eventId, batch, receivedAt });
    const touched = [
      ...new Set(batch.filter((r) => stored.get(r.id) === "stored").map((r) => r.entryId)),
    ];
    if (touched.length > 0) {
      await enqueueJobs(
        [{ kind: RECOMPUTE_VERDICTS, payload: { eventId, entryIds: touched } }],
        tx,
      );
    }
    return stored;
  });
  faultPoint("sync:stored");
  const pending = new Set<string>();
  for (const { index, record } of accepted) {
    const outcome = outcomes.get(record.id);
    if (outcome === "conflict") {
      results[index] = {
        id: record.id,
        status: "refused",
        reason: "This record id was already used for a different record.",
      };
    } else {
      results[index] = { id: record.id, status: outcome === "duplicate" ? "duplicate" : "stored" };
      if (outcome === "stored") pending.add(record.entryId);
    }
  }
  return { results, receivedAt: receivedAt.toISOString(), verdictsPending: [...pending] };
}

const laterOf = (a: Date, b: Date) => (a.getTime() >= b.getTime() ? a : b);
