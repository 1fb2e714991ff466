import "server-only";
import { and, eq } from "drizzle-orm";
import { alias } from "drizzle-orm/mysql-core";
import { getDb } from "../client";
import { cars, entries, events, ruleSetVersions, users, verdicts } from "../schema";

const coDriver = alias(users, "co_driver");

/** An entry with its car, drivers, event and stored verdict (null verdict while nothing is derived). */
export async function getEntryVerdict({ entryId }: { entryId: string }) {
  const [row] = await getDb()
    .select({
      entryId: entries.id,
      eventId: entries.eventId,
      eventName: events.name,
      eventDate: events.eventDate,
      timeZone: events.timeZone,
      carNumber: entries.carNumber,
      declaredClass: entries.declaredClass,
      make: cars.make,
      model: cars.model,
      year: cars.year,
      driverName: users.name,
      coDriverName: coDriver.name,
      status: verdicts.status,
      finalClass: verdicts.finalClass,
      reason: verdicts.reason,
      result: verdicts.result,
      computedAt: verdicts.computedAt,
      ruleSetBody: ruleSetVersions.body,
    })
    .from(entries)
    .innerJoin(events, eq(events.id, entries.eventId))
    .innerJoin(ruleSetVersions, eq(ruleSetVersions.id, events.ruleSetVersionId))
    .innerJoin(cars, eq(cars.id, entries.carId))
    .innerJoin(users, eq(users.id, entries.driverId))
    .leftJoin(coDriver, eq(coDriver.id, entries.coDriverId))
    .leftJoin(
      verdicts,
      and(eq(verdicts.eventId, entries.eventId), eq(verdicts.entryId, entries.id)),
    )
    .where(eq(entries.id, entryId))
    .limit(1);
  return row ?? null;
}
