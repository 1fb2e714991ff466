import "server-only";
import { and, eq, or } from "drizzle-orm";
import type { Role } from "../../lib/auth/roles";
import { getDb } from "../client";
import { cars, entries, eventOfficials } from "../schema";

/** The roles a user holds in one event: official roles, plus "entrant" when they drive, co-drive
 *  or own the car of an entry in it. */
export async function getEventRoles({
  eventId,
  userId,
}: {
  eventId: string;
  userId: string;
}): Promise<Role[]> {
  const db = getDb();
  const [officialRows, entrantRows] = await Promise.all([
    db
      .select({ role: eventOfficials.role })
      .from(eventOfficials)
      .where(and(eq(eventOfficials.eventId, eventId), eq(eventOfficials.userId, userId))),
    db
      .select({ id: entries.id })
      .from(entries)
      .innerJoin(cars, eq(cars.id, entries.carId))
      .where(
        and(
          eq(entries.eventId, eventId),
          or(
            eq(entries.driverId, userId),
            eq(entries.coDriverId, userId),
            eq(cars.ownerId, userId),
          ),
        ),
      )
      .limit(1),
  ]);
  const roles: Role[] = officialRows.map((r) => r.role);
  if (entrantRows.length > 0) roles.push("entrant");
  return roles;
}
