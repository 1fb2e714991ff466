import "server-only";
import { eq } from "drizzle-orm";
import { getDb } from "../client";
import { eventOfficials } from "../schema";

/** True when the user holds an official role in at least one event. */
export async function isEventOfficial({ userId }: { userId: string }): Promise<boolean> {
  const rows = await getDb()
    .select({ userId: eventOfficials.userId })
    .from(eventOfficials)
    .where(eq(eventOfficials.userId, userId))
    .limit(1);
  return rows.length > 0;
}
