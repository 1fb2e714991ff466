import "server-only";
import { and, asc, eq } from "drizzle-orm";
import { alias } from "drizzle-orm/mysql-core";
import { getDb } from "../client";
import { cars, entries, users } from "../schema";

const coDriver = alias(users, "co_driver");

/** The tech line's view of an event's entries: number, car, drivers, class and declarations. */
export async function listPackEntries({ eventId }: { eventId: string }) {
  const rows = await getDb()
    .select({
      entryId: entries.id,
      carNumber: entries.carNumber,
      declaredClassId: entries.declaredClass,
      declarations: entries.declarations,
      make: cars.make,
      model: cars.model,
      year: cars.year,
      colour: cars.colour,
      driverName: users.name,
      coDriverName: coDriver.name,
    })
    .from(entries)
    .innerJoin(cars, eq(cars.id, entries.carId))
    .innerJoin(users, eq(users.id, entries.driverId))
    .leftJoin(coDriver, eq(coDriver.id, entries.coDriverId))
    .where(and(eq(entries.eventId, eventId), eq(entries.status, "entered")))
    .orderBy(asc(entries.carNumber));
  return rows.map((r) => ({
    entryId: r.entryId,
    carNumber: r.carNumber,
    declaredClassId: r.declaredClassId,
    declarations: r.declarations,
    car: `${r.year} ${r.make} ${r.model}`,
    colour: r.colour,
    drivers: [r.driverName, r.coDriverName].filter(Boolean).join(" & "),
  }));
}
