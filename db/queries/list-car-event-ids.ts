import "server-only";
import { and, eq, ne } from "drizzle-orm";
import { getDb } from "../client";
import { entries } from "../schema";

/** The events a car is entered in (withdrawn entries left out). */
export async function listCarEventIds({ carId }: { carId: string }): Promise<string[]> {
  const rows = await getDb()
    .selectDistinct({ eventId: entries.eventId })
    .from(entries)
    .where(and(eq(entries.carId, carId), ne(entries.status, "withdrawn")));
  return rows.map((r) => r.eventId);
}
