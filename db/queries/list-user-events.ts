import "server-only";
import { asc, eq, inArray, or } from "drizzle-orm";
import type { Role } from "../../lib/auth/roles";
import { getDb } from "../client";
import { cars, entries, eventOfficials, events, venues } from "../schema";

export type UserEvent = {
  id: string;
  name: string;
  eventDate: string;
  venueName: string;
  status: string;
  roles: Role[];
};

/** Every event in which the user is an official or an entrant, soonest first, with their roles. */
export async function listUserEvents({ userId }: { userId: string }): Promise<UserEvent[]> {
  const db = getDb();
  const [official, entrant] = await Promise.all([
    db
      .select({ eventId: eventOfficials.eventId, role: eventOfficials.role })
      .from(eventOfficials)
      .where(eq(eventOfficials.userId, userId)),
    db
      .selectDistinct({ eventId: entries.eventId })
      .from(entries)
      .innerJoin(cars, eq(cars.id, entries.carId))
      .where(
        or(eq(entries.driverId, userId), eq(entries.coDriverId, userId), eq(cars.ownerId, userId)),
      ),
  ]);
  const roles = new Map<string, Role[]>();
  for (const row of official) roles.set(row.eventId, [...(roles.get(row.eventId) ?? []), row.role]);
  for (const row of entrant) roles.set(row.eventId, [...(roles.get(row.eventId) ?? []), "entrant"]);
  if (roles.size === 0) return [];
  const rows = await db
    .select({
      id: events.id,
      name: events.name,
      eventDate: events.eventDate,
      status: events.status,
      venueName: venues.name,
    })
    .from(events)
    .innerJoin(venues, eq(venues.id, events.venueId))
    .where(inArray(events.id, [...roles.keys()]))
    .orderBy(asc(events.eventDate));
  return rows.map((row) => ({ ...row, roles: roles.get(row.id) ?? [] }));
}
