import "server-only";
import { eq } from "drizzle-orm";
import { alias } from "drizzle-orm/mysql-core";
import { getDb } from "../../client";
import type { Tx } from "../../run-transaction";
import { entries, events, users } from "../../schema";
import { getEntrySignOnRecords } from "./get-entry-sign-on-records";

const coDriver = alias(users, "co_driver");

/** What decides whether an entry is signed on, and who its drivers are (to tell them); or null. */
export async function getEntrySignOnFacts({ entryId }: { entryId: string }, tx?: Tx) {
  const db = tx ?? getDb();
  const [row] = await db
    .select({
      entryId: entries.id,
      eventId: entries.eventId,
      carNumber: entries.carNumber,
      entryStatus: entries.status,
      driverId: entries.driverId,
      driverName: users.name,
      driverEmail: users.email,
      coDriverId: entries.coDriverId,
      coDriverName: coDriver.name,
      coDriverEmail: coDriver.email,
      eventName: events.name,
      eventDate: events.eventDate,
    })
    .from(entries)
    .innerJoin(events, eq(events.id, entries.eventId))
    .innerJoin(users, eq(users.id, entries.driverId))
    .leftJoin(coDriver, eq(coDriver.id, entries.coDriverId))
    .where(eq(entries.id, entryId))
    .limit(1);
  if (!row) return null;
  return { ...row, ...(await getEntrySignOnRecords({ eventId: row.eventId, entryId }, tx)) };
}
