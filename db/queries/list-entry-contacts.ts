import "server-only";
import { and, eq, inArray } from "drizzle-orm";
import { alias } from "drizzle-orm/mysql-core";
import { getDb } from "../client";
import { entries, events, users } from "../schema";

const coDriver = alias(users, "co_driver");

/** Who to tell about an entry: driver and co-driver e-mails, with the car number and event. */
export async function listEntryContacts({
  eventId,
  entryIds,
}: {
  eventId: string;
  entryIds: string[];
}) {
  if (entryIds.length === 0) return [];
  return getDb()
    .select({
      entryId: entries.id,
      carNumber: entries.carNumber,
      eventName: events.name,
      driverEmail: users.email,
      driverName: users.name,
      coDriverEmail: coDriver.email,
    })
    .from(entries)
    .innerJoin(events, eq(events.id, entries.eventId))
    .innerJoin(users, eq(users.id, entries.driverId))
    .leftJoin(coDriver, eq(coDriver.id, entries.coDriverId))
    .where(and(eq(entries.eventId, eventId), inArray(entries.id, entryIds)));
}
