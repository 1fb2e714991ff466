import "server-only";
import { and, eq, ne, sql } from "drizzle-orm";
import { getDb } from "../../client";
import { clubs, entries, events, ruleSetVersions, venues } from "../../schema";

/** One public event by its slug (drafts are not public), with places taken; null if none. */
export async function getPublicEvent({ slug }: { slug: string }) {
  const [row] = await getDb()
    .select({
      id: events.id,
      slug: events.slug,
      name: events.name,
      eventDate: events.eventDate,
      timeZone: events.timeZone,
      unitSystem: events.unitSystem,
      status: events.status,
      capacity: events.capacity,
      entryFeeMinor: events.entryFeeMinor,
      currency: events.currency,
      entriesOpenAt: events.entriesOpenAt,
      entriesCloseAt: events.entriesCloseAt,
      waiverText: events.waiverText,
      waiverVersion: events.waiverVersion,
      refundPolicy: events.refundPolicy,
      clubName: clubs.name,
      venueName: venues.name,
      ruleSetBody: ruleSetVersions.body,
      entered: sql<number>`(select count(*) from ${entries} where ${entries.eventId} = ${events.id} and ${entries.status} = 'entered')`,
      waiting: sql<number>`(select count(*) from ${entries} where ${entries.eventId} = ${events.id} and ${entries.status} = 'waiting')`,
    })
    .from(events)
    .innerJoin(clubs, eq(clubs.id, events.clubId))
    .innerJoin(venues, eq(venues.id, events.venueId))
    .innerJoin(ruleSetVersions, eq(ruleSetVersions.id, events.ruleSetVersionId))
    .where(and(eq(events.slug, slug), ne(events.status, "draft")))
    .limit(1);
  return row ? { ...row, entered: Number(row.entered), waiting: Number(row.waiting) } : null;
}

export type PublicEvent = NonNullable<Awaited<ReturnType<typeof getPublicEvent>>>;
