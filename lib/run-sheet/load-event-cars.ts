import "server-only";
import { getEventRuleSet } from "../../db/queries/get-event-rule-set";
import { getEventSummary } from "../../db/queries/get-event-summary";
import { listEventEntries } from "../../db/queries/list-event-entries";
import { listRegistrationStatus } from "../../db/queries/list-registration-status";
import { listOpenReinspections } from "../../db/queries/reinspections/list-open-reinspections";
import { signOnState } from "../entries/sign-on-state";
import { AppError } from "../errors";
import type { Drive } from "../paddock/drive";
import type { ClerkCar } from "./clerk-view";
import { toDrives } from "./to-drives";

/**
 * The event's cars as the clerk of course needs them: tech state, sign-on, open re-inspections,
 * whether each is ready to run, and the drives of the ready ones (in the class they run in today).
 */
export async function loadEventCars({ eventId }: { eventId: string }) {
  const [summary, context, rows, registration, reinspections] = await Promise.all([
    getEventSummary({ eventId }),
    getEventRuleSet({ eventId }),
    listEventEntries({ eventId }),
    listRegistrationStatus({ eventId }),
    listOpenReinspections({ eventId }),
  ]);
  if (!summary || !context) throw new AppError("not_found", "No such event.");
  const ladder = context.ruleSet.classes;
  const open = new Map(reinspections.map((r) => [r.entryId, r]));
  const cars: ClerkCar[] = rows.map((row) => {
    const signOn = signOnState(registration.get(row.entryId) ?? { waiver: "missing", paid: false });
    const passed = row.status === "cleared" || row.status === "moved-up";
    const reinspection = open.get(row.entryId) ?? null;
    const drivers = [row.driverName, row.coDriverName].filter(Boolean).join(" & ");
    return {
      entryId: row.entryId,
      carNumber: row.carNumber,
      car: `${row.year} ${row.make} ${row.model}`,
      drivers,
      declaredClassName: row.declaredClassName,
      runsInClassName: passed ? row.finalClassName : null,
      status: row.status,
      reason: row.reason,
      signOn,
      withdrawn: false,
      reinspection: reinspection
        ? {
            id: reinspection.id,
            cause: reinspection.cause,
            askedBy: reinspection.askedBy,
            askedAt: reinspection.askedAt,
            reason: reinspection.reason,
          }
        : null,
      ready: passed && signOn.signedOn && reinspection === null,
    };
  });
  const readyIds = new Set(cars.filter((c) => c.ready).map((c) => c.entryId));
  const drives: Drive[] = toDrives(
    rows
      .filter((row) => readyIds.has(row.entryId) && row.finalClass)
      .map((row) => {
        const classId = row.finalClass ?? row.declaredClass;
        const rank = ladder.findIndex((c) => c.id === classId);
        return {
          ...row,
          classId,
          className: row.finalClassName ?? classId,
          classRank: Math.max(0, rank),
        };
      }),
  );
  return { summary, context, cars, drives };
}
