import "server-only";
import { personName } from "@/lib/auth/person-name";
import { isRecomputePending } from "../../db/queries/jobs/is-recompute-pending";
import { listEventOfficials } from "../../db/queries/list-event-officials";
import { authorizeEntryRead } from "../auth/authorize-entry-read";
import type { SessionUser } from "../auth/get-session-user";
import { classNamesFromRuleSet } from "../passes/class-names-from-rule-set";
import { formatWhoAndWhen } from "../tech/format-who-and-when";
import type { EntryResult } from "./entry-result";
import { parseStoredVerdict } from "./parse-stored-verdict";

/**
 * An entry's result for a person allowed to see it: its driver, co-driver or car owner, or an
 * official of the event who may read entries. Everyone else gets 403, an unknown entry 404.
 */
export async function loadEntryResult({
  entryId,
  user,
}: {
  entryId: string;
  user: SessionUser;
}): Promise<EntryResult> {
  // Asked before the verdict is read: "not recomputing" then means the verdict read counts every
  // record stored so far.
  const recomputing = await isRecomputePending({ entryId });
  const { row } = await authorizeEntryRead({ entryId, user });
  // A stored verdict that does not read as one counts as none: the car shows as Waiting.
  const verdict = parseStoredVerdict({ entryId: row.entryId, result: row.result });
  const names = classNamesFromRuleSet(row.ruleSetBody);
  const className = (id: string | null) => (id ? (names[id] ?? id) : null);
  const order: Record<string, number> = {
    fail: 0,
    inconclusive: 1,
    waiting: 2,
    pass: 3,
    "not-applicable": 4,
  };
  const check = verdict?.classChecks.find((c) => c.classId === verdict.declaredClassId);
  const lines = [
    ...(check?.rules ?? []),
    ...(verdict?.eventRules ?? []),
    ...(verdict?.safety ?? []),
  ]
    .filter((r) => r.outcome !== "not-applicable")
    .map((r) => ({ outcome: r.outcome, reason: r.reason }))
    .sort((a, b) => (order[a.outcome] ?? 9) - (order[b.outcome] ?? 9));
  // Who decided is the official's name from the event's list, never an id.
  const override = verdict?.override ?? null;
  const decider = override
    ? (await listEventOfficials({ eventId: row.eventId })).find(
        (o) => o.userId === override.officialId,
      )
    : undefined;
  return {
    entryId: row.entryId,
    eventId: row.eventId,
    eventName: row.eventName,
    carNumber: row.carNumber,
    car: `${row.year} ${row.make} ${row.model}`,
    drivers: [row.driverName, row.coDriverName].filter(Boolean).join(" & "),
    declaredClass: className(row.declaredClass) ?? row.declaredClass,
    status: verdict ? (row.status ?? "waiting") : "waiting",
    className: verdict ? className(row.finalClass) : null,
    reason:
      (verdict ? row.reason : null) ??
      "Not scrutineered yet. Bring the car and your pass to the tech line.",
    decidedBy: override
      ? formatWhoAndWhen({
          name: decider ? personName(decider) : null,
          deviceTime: override.deviceTime,
          timeZone: row.timeZone,
        })
      : null,
    lines,
    notice: verdict?.notice ?? null,
    computedAt: verdict && row.computedAt ? row.computedAt.toISOString() : null,
    recomputing,
  };
}
