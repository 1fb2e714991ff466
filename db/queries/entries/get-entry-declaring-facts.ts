import "server-only";
import { eq } from "drizzle-orm";
import { getDb } from "../../client";
import { cars, entries, events } from "../../schema";

/** What the declarations page and its action need about an entry: who may declare, the class,
 *  the stored declarations, and whether the entry and its event still take them; or null. */
export async function getEntryDeclaringFacts({ entryId }: { entryId: string }) {
  const [row] = await getDb()
    .select({
      entryId: entries.id,
      eventId: entries.eventId,
      carNumber: entries.carNumber,
      declaredClass: entries.declaredClass,
      driverId: entries.driverId,
      coDriverId: entries.coDriverId,
      ownerId: cars.ownerId,
      entryStatus: entries.status,
      declarations: entries.declarations,
      car: cars.make,
      model: cars.model,
      year: cars.year,
      eventName: events.name,
      eventStatus: events.status,
    })
    .from(entries)
    .innerJoin(cars, eq(cars.id, entries.carId))
    .innerJoin(events, eq(events.id, entries.eventId))
    .where(eq(entries.id, entryId))
    .limit(1);
  return row ?? null;
}
