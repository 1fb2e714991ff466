import "server-only";
import { and, asc, eq, isNull, notInArray } from "drizzle-orm";
import { getDb } from "../../client";
import { cars, entries } from "../../schema";

/** The person's cars that may enter the event: not retired, not already entered or waiting in it. */
export async function listEnterableCars({ userId, eventId }: { userId: string; eventId: string }) {
  const db = getDb();
  const inEvent = db
    .select({ carId: entries.carId })
    .from(entries)
    .where(and(eq(entries.eventId, eventId), notInArray(entries.status, ["withdrawn"])));
  return db
    .select({
      id: cars.id,
      make: cars.make,
      model: cars.model,
      year: cars.year,
      colour: cars.colour,
      bodyWidthMm: cars.bodyWidthMm,
      roofHeightMm: cars.roofHeightMm,
    })
    .from(cars)
    .where(and(eq(cars.ownerId, userId), isNull(cars.retiredAt), notInArray(cars.id, inEvent)))
    .orderBy(asc(cars.make), asc(cars.model), asc(cars.year));
}
