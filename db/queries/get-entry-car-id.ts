import "server-only";
import { and, eq } from "drizzle-orm";
import { getDb } from "../client";
import { entries } from "../schema";

/** The car of an entry in an event, or null when the event has no such entry. */
export async function getEntryCarId({
  eventId,
  entryId,
}: {
  eventId: string;
  entryId: string;
}): Promise<string | null> {
  const [row] = await getDb()
    .select({ carId: entries.carId })
    .from(entries)
    .where(and(eq(entries.eventId, eventId), eq(entries.id, entryId)))
    .limit(1);
  return row?.carId ?? null;
}
