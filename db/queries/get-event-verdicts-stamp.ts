import "server-only";
import { count, eq, sql } from "drizzle-orm";
import { getDb } from "../client";
import { verdicts } from "../schema";

/**
 * What the event pack's ETag knows of an event's stored verdicts without reading them: how many,
 * the latest `computed_at`, and the sum of every `computed_at` (microseconds, exact). A verdict is
 * rewritten in place, each time with a later `computed_at`, so the sum moves on every rewrite —
 * even one that lands after a newer verdict of another car (two recomputes finishing out of
 * order), which the count and the latest time alone would miss.
 */
export async function getEventVerdictsStamp({ eventId }: { eventId: string }) {
  const [row] = await getDb()
    .select({
      count: count(),
      lastComputedAt: sql<string | null>`cast(max(${verdicts.computedAt}) as char)`,
      computedAtSum: sql<
        string | null
      >`cast(sum(timestampdiff(microsecond, '2000-01-01', ${verdicts.computedAt})) as char)`,
    })
    .from(verdicts)
    .where(eq(verdicts.eventId, eventId));
  return {
    count: Number(row?.count ?? 0),
    lastComputedAt: row?.lastComputedAt ?? null,
    computedAtSum: row?.computedAtSum ?? null,
  };
}
