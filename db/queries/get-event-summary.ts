import "server-only";
import { eq } from "drizzle-orm";
import { getDb } from "../client";
import { clubs, events, ruleSetVersions, venues } from "../schema";

/** The event with its venue, club and pinned rule-set version number, or null. */
export async function getEventSummary({ eventId }: { eventId: string }) {
  const [row] = await getDb()
    .select({
      id: events.id,
      name: events.name,
      slug: events.slug,
      eventDate: events.eventDate,
      timeZone: events.timeZone,
      unitSystem: events.unitSystem,
      status: events.status,
      capacity: events.capacity,
      entryFeeMinor: events.entryFeeMinor,
      currency: events.currency,
      ruleSetVersionId: events.ruleSetVersionId,
      ruleSetVersion: ruleSetVersions.version,
      venueName: venues.name,
      trackLengthM: venues.trackLengthM,
      maxCarsOnTrack: venues.maxCarsOnTrack,
      carsPerKm: venues.carsPerKm,
      protestWindowMinutes: events.protestWindowMinutes,
      clubName: clubs.name,
    })
    .from(events)
    .innerJoin(venues, eq(venues.id, events.venueId))
    .innerJoin(clubs, eq(clubs.id, events.clubId))
    .innerJoin(ruleSetVersions, eq(ruleSetVersions.id, events.ruleSetVersionId))
    .where(eq(events.id, eventId))
    .limit(1);
  return row ?? null;
}

export type EventSummary = NonNullable<Awaited<ReturnType<typeof getEventSummary>>>;
