import "server-only";
import { eq } from "drizzle-orm";
import { getDb } from "../client";
import { eventPassKeys } from "../schema";

/** The event a pass key belongs to (retired or not), or null when no event has that key. */
export async function getPassKeyEventId({ kid }: { kid: string }): Promise<string | null> {
  const [row] = await getDb()
    .select({ eventId: eventPassKeys.eventId })
    .from(eventPassKeys)
    .where(eq(eventPassKeys.kid, kid))
    .limit(1);
  return row?.eventId ?? null;
}
