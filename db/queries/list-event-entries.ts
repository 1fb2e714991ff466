import "server-only";
import { and, asc, eq } from "drizzle-orm";
import { alias } from "drizzle-orm/mysql-core";
import { classNamesFromRuleSet } from "../../lib/passes/class-names-from-rule-set";
import { getDb } from "../client";
import { cars, entries, events, ruleSetVersions, users, verdicts } from "../schema";

const coDriver = alias(users, "co_driver");

/** An event's entries (not withdrawn) with car, drivers and the stored verdict, by car number,
 *  with class names from the event's rule set beside the class ids. */
export async function listEventEntries({ eventId }: { eventId: string }) {
  const [ruleSet] = await getDb()
    .select({ body: ruleSetVersions.body })
    .from(events)
    .innerJoin(ruleSetVersions, eq(ruleSetVersions.id, events.ruleSetVersionId))
    .where(eq(events.id, eventId))
    .limit(1);
  const names = classNamesFromRuleSet(ruleSet?.body);
  const rows = await getDb()
    .select({
      entryId: entries.id,
      carNumber: entries.carNumber,
      declaredClass: entries.declaredClass,
      lapTimeEstimateMs: entries.lapTimeEstimateMs,
      carId: entries.carId,
      driverId: entries.driverId,
      coDriverId: entries.coDriverId,
      driverExperience: entries.driverExperience,
      coDriverExperience: entries.coDriverExperience,
      coDriverLapTimeEstimateMs: entries.coDriverLapTimeEstimateMs,
      make: cars.make,
      model: cars.model,
      year: cars.year,
      colour: cars.colour,
      driverName: users.name,
      coDriverName: coDriver.name,
      status: verdicts.status,
      finalClass: verdicts.finalClass,
      reason: verdicts.reason,
      needsChief: verdicts.needsChief,
      computedAt: verdicts.computedAt,
    })
    .from(entries)
    .innerJoin(cars, eq(cars.id, entries.carId))
    .innerJoin(users, eq(users.id, entries.driverId))
    .leftJoin(coDriver, eq(coDriver.id, entries.coDriverId))
    .leftJoin(
      verdicts,
      and(eq(verdicts.eventId, entries.eventId), eq(verdicts.entryId, entries.id)),
    )
    .where(and(eq(entries.eventId, eventId), eq(entries.status, "entered")))
    .orderBy(asc(entries.carNumber));
  return rows.map((row) => ({
    ...row,
    declaredClassName: names[row.declaredClass] ?? row.declaredClass,
    finalClassName: row.finalClass ? (names[row.finalClass] ?? row.finalClass) : null,
    status: row.status ?? "waiting",
    needsChief: row.needsChief ?? false,
  }));
}

export type EventEntryRow = Awaited<ReturnType<typeof listEventEntries>>[number];
