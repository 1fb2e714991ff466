import "server-only";
import { getEventRuleSet } from "../../db/queries/get-event-rule-set";
import { insertRecords } from "../../db/queries/insert-records";
import { listEventEntryIds } from "../../db/queries/list-event-entry-ids";
import type { SessionUser } from "../auth/get-session-user";
import { can } from "../auth/permissions";
import type { Role } from "../auth/roles";
import { AppError } from "../errors";
import { recordSchema, type TechRecord } from "../scrutineer/record-schema";
import { needsChiefScrutineer } from "./needs-chief-scrutineer";
import { notifyVerdictChanges } from "./notify-verdict-changes";
import { recomputeVerdicts } from "./recompute-verdicts";
import { recordPermission } from "./record-permission";
import type { SyncRecordResult, SyncResponse } from "./sync-schema";

/**
 * Accept a batch from a phone's outbox: check every record on its own (shape, who made it, the
 * permission for its kind, that its entry is in this event), store the good ones idempotently in
 * one transaction, re-derive the verdicts of the entries touched, tell entrants what changed, and
 * answer per record. A bad record never stops the good ones; nothing is silently dropped.
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
  const context = await getEventRuleSet({ eventId });
  if (!context) throw new AppError("not_found", "No such event.");

  const results: SyncRecordResult[] = new Array(rawRecords.length);
  const candidates: { index: number; record: TechRecord }[] = [];
  rawRecords.forEach((raw, index) => {
    const parsed = recordSchema.safeParse(raw);
    const id =
      typeof (raw as { id?: unknown })?.id === "string" ? (raw as { id: string }).id : null;
    if (!parsed.success) {
      const issue = parsed.error.issues[0];
      const where = issue?.path.length ? `${issue.path.join(".")}: ` : "";
      results[index] = {
        id,
        status: "refused",
        reason: `${where}${issue?.message ?? "not a valid record"}`,
      };
      return;
    }
    const record = parsed.data;
    if (record.officialId !== user.id) {
      results[index] = {
        id,
        status: "refused",
        reason: "Made under another official's sign-in; sign in as them to send it.",
      };
    } else if (!can(roles, recordPermission[record.kind])) {
      results[index] = {
        id,
        status: "refused",
        reason: `Your role in this event cannot record a ${record.kind}.`,
      };
    } else {
      candidates.push({ index, record });
    }
  });

  const known = await listEventEntryIds({
    eventId,
    entryIds: [...new Set(candidates.map((c) => c.record.entryId))],
  });
  const accepted = candidates.filter(({ index, record }) => {
    if (known.has(record.entryId)) return true;
    results[index] = {
      id: record.id,
      status: "refused",
      reason: "That car is not entered in this event.",
    };
    return false;
  });

  const outcomes = await insertRecords({
    eventId,
    batch: accepted.map((a) => a.record),
    receivedAt: now,
  });
  const touched = new Set<string>();
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
      touched.add(record.entryId);
    }
  }

  const changes = await recomputeVerdicts({ eventId, entryIds: [...touched], now });
  await notifyVerdictChanges({ eventId, changes, ruleSet: context.ruleSet });
  return {
    results,
    receivedAt: now.toISOString(),
    verdicts: changes.map(({ entryId, verdict }) => ({
      entryId,
      status: verdict.status,
      classId: verdict.classId,
      reason: verdict.reason,
      flags: verdict.flags,
      needsChief: needsChiefScrutineer(verdict),
      computedAt: now.toISOString(),
    })),
  };
}
