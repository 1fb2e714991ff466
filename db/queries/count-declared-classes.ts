import "server-only";
import { count, eq } from "drizzle-orm";
import { getDb } from "../client";
import { entries } from "../schema";

/** How many of the event's entries (withdrawn ones too: their verdicts are kept) declare each class. */
export async function countDeclaredClasses({
  eventId,
}: {
  eventId: string;
}): Promise<Map<string, number>> {
  const rows = await getDb()
    .select({ classId: entries.declaredClass, n: count() })
    .from(entries)
    .where(eq(entries.eventId, eventId))
    .groupBy(entries.declaredClass);
  return new Map(rows.map((r) => [r.classId, r.n]));
}
