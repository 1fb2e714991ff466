import "server-only";
import { eq } from "drizzle-orm";
import { getDb } from "../client";
import { events } from "../schema";

/** Whether an event with this id exists. */
export async function eventExists({ eventId }: { eventId: string }): Promise<boolean> {
  const [row] = await getDb()
    .select({ id: events.id })
    .from(events)
    .where(eq(events.id, eventId))
    .limit(1);
  return row !== undefined;
}
