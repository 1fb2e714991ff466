import "server-only";
import { asc, eq, inArray } from "drizzle-orm";
import { type RuleSet, ruleSetSchema } from "../../../lib/scrutineer/rule-sets/rule-set-schema";
import { getDb } from "../../client";
import { events, ruleSetVersions } from "../../schema";

/** An upcoming event as the pre-check offers it: its rule set comes with the page. */
export type PrecheckEvent = {
  slug: string;
  name: string;
  eventDate: string;
  status: "entries-open" | "entries-closed" | "running";
  unitSystem: "mm" | "in";
  ruleSet: RuleSet;
};

/**
 * Events not yet over (entries open or closed, or running today), soonest first, each with its
 * pinned rule set. A version that no longer parses is left out rather than breaking the page.
 */
export async function listPrecheckEvents(): Promise<PrecheckEvent[]> {
  const rows = await getDb()
    .select({
      slug: events.slug,
      name: events.name,
      eventDate: events.eventDate,
      status: events.status,
      unitSystem: events.unitSystem,
      body: ruleSetVersions.body,
    })
    .from(events)
    .innerJoin(ruleSetVersions, eq(ruleSetVersions.id, events.ruleSetVersionId))
    .where(inArray(events.status, ["entries-open", "entries-closed", "running"]))
    .orderBy(asc(events.eventDate), asc(events.slug))
    .limit(20);
  return rows.flatMap((row) => {
    const parsed = ruleSetSchema.safeParse(row.body);
    if (!parsed.success) return [];
    if (row.status === "draft" || row.status === "finished") return [];
    return [
      {
        slug: row.slug,
        name: row.name,
        eventDate: row.eventDate,
        status: row.status,
        unitSystem: row.unitSystem,
        ruleSet: parsed.data,
      },
    ];
  });
}
