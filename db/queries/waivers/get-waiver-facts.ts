import "server-only";
import { and, eq } from "drizzle-orm";
import { alias } from "drizzle-orm/mysql-core";
import { getDb } from "../../client";
import type { Tx } from "../../run-transaction";
import { entries, events, users, waivers } from "../../schema";

const coDriver = alias(users, "co_driver");

/**
 * An entry's waiver as its page and the signing need it: the event's text and version, the
 * drivers (name, e-mail, date of birth) and every acceptance stored; or null for no such entry.
 * With `tx` and `lock`, the entry's row is locked first, so two acceptances by one driver at
 * once store one.
 */
export async function getWaiverFacts(
  { entryId, lock = false }: { entryId: string; lock?: boolean },
  tx?: Tx,
) {
  const db = tx ?? getDb();
  // Only the entry's row is locked (not the event's, which entering locks for its capacity).
  if (lock)
    await db.select({ id: entries.id }).from(entries).where(eq(entries.id, entryId)).for("update");
  const [row] = await db
    .select({
      entryId: entries.id,
      eventId: entries.eventId,
      carNumber: entries.carNumber,
      entryStatus: entries.status,
      driverId: entries.driverId,
      driverName: users.name,
      driverEmail: users.email,
      driverDateOfBirth: users.dateOfBirth,
      coDriverId: entries.coDriverId,
      coDriverName: coDriver.name,
      coDriverEmail: coDriver.email,
      coDriverDateOfBirth: coDriver.dateOfBirth,
      eventName: events.name,
      eventDate: events.eventDate,
      timeZone: events.timeZone,
      eventStatus: events.status,
      waiverText: events.waiverText,
      waiverVersion: events.waiverVersion,
    })
    .from(entries)
    .innerJoin(events, eq(events.id, entries.eventId))
    .innerJoin(users, eq(users.id, entries.driverId))
    .leftJoin(coDriver, eq(coDriver.id, entries.coDriverId))
    .where(eq(entries.id, entryId))
    .limit(1);
  if (!row) return null;
  const signed = await db
    .select({
      id: waivers.id,
      signerId: waivers.signerId,
      signedName: waivers.signedName,
      signedAt: waivers.signedAt,
      isMinor: waivers.isMinor,
      textVersion: waivers.textVersion,
      guardianName: waivers.guardianName,
      guardianEmail: waivers.guardianEmail,
      guardianRequestedAt: waivers.guardianRequestedAt,
      guardianSignedAt: waivers.guardianSignedAt,
    })
    .from(waivers)
    .where(and(eq(waivers.eventId, row.eventId), eq(waivers.entryId, entryId)));
  return { ...row, waivers: signed };
}

export type WaiverFacts = NonNullable<Awaited<ReturnType<typeof getWaiverFacts>>>;
