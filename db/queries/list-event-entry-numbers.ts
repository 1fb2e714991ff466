import "server-only";
import { eq } from "drizzle-orm";
import { getDb } from "../client";
import { entries } from "../schema";

/** Car numbers of all of an event's entries (withdrawn ones too), by entry id. */
export async function listEventEntryNumbers({ eventId }: { eventId: string }) {
  const rows = await getDb()
    .select({ id: entries.id, carNumber: entries.carNumber })
    .from(entries)
    .where(eq(entries.eventId, eventId));
  return new Map(rows.map((r) => [r.id, r.carNumber]));
}
