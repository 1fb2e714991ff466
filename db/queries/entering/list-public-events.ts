import "server-only";
import { and, asc, eq, inArray, sql } from "drizzle-orm";
import { getDb } from "../../client";
import { clubs, entries, events, ruleSetVersions, venues } from "../../schema";

/**
 * Events the public may see (not drafts, not finished), soonest first, with how many entries
 * are in the field (`entered`; the waiting list does not take a place).
 */
export async function listPublicEvents() {
  const enteredCount = getDb()
    .select({ eventId: entries.eventId, n: sql<number>`count(*)`.as("n") })
    .from(entries)
    .where(eq(entries.status, "entered"))
    .groupBy(entries.eventId)
    .as("entered_count");
  return getDb()
    .select({
      id: events.id,
      slug: events.slug,
      name: events.name,
      eventDate: events.eventDate,
      timeZone: events.timeZone,
      status: events.status,
      capacity: events.capacity,
      entryFeeMinor: events.entryFeeMinor,
      currency: events.currency,
      entriesOpenAt: events.entriesOpenAt,
      entriesCloseAt: events.entriesCloseAt,
      clubName: clubs.name,
      venueName: venues.name,
      ruleSetBody: ruleSetVersions.body,
      entered: sql<number>`coalesce(${enteredCount.n}, 0)`,
    })
    .from(events)
    .innerJoin(clubs, eq(clubs.id, events.clubId))
    .innerJoin(venues, eq(venues.id, events.venueId))
    .innerJoin(ruleSetVersions, eq(ruleSetVersions.id, events.ruleSetVersionId))
    .leftJoin(enteredCount, eq(enteredCount.eventId, events.id))
    .where(and(inArray(events.status, ["entries-open", "entries-closed", "running"])))
    .orderBy(asc(events.eventDate), asc(events.name));
}

export type PublicEventRow = Awaited<ReturnType<typeof listPublicEvents>>[number];
