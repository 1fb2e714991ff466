import "server-only";
import { asc, eq } from "drizzle-orm";
import { getDb } from "../client";
import { eventOfficials, users } from "../schema";

/** Who officiates at the event, by role. */
export async function listEventOfficials({ eventId }: { eventId: string }) {
  return getDb()
    .select({ userId: users.id, name: users.name, email: users.email, role: eventOfficials.role })
    .from(eventOfficials)
    .innerJoin(users, eq(users.id, eventOfficials.userId))
    .where(eq(eventOfficials.eventId, eventId))
    .orderBy(asc(eventOfficials.role), asc(users.name));
}
