import "server-only";
import { eq } from "drizzle-orm";
import { type RuleSet, ruleSetSchema } from "../../lib/scrutineer/rule-sets/rule-set-schema";
import { getDb } from "../client";
import { events, ruleSetVersions } from "../schema";

// Rule-set versions never change once an event pins them, so a parsed copy can be kept.
const parsedVersions = new Map<string, RuleSet>();

export type EventRuleContext = {
  eventId: string;
  eventDate: string;
  timeZone: string;
  unitSystem: "mm" | "in";
  ruleSetVersionId: string;
  ruleSet: RuleSet;
};

/** The event's date, units and its pinned rule set (validated), or null for an unknown event. */
export async function getEventRuleSet({
  eventId,
}: {
  eventId: string;
}): Promise<EventRuleContext | null> {
  const [row] = await getDb()
    .select({
      eventDate: events.eventDate,
      timeZone: events.timeZone,
      unitSystem: events.unitSystem,
      ruleSetVersionId: events.ruleSetVersionId,
      body: ruleSetVersions.body,
    })
    .from(events)
    .innerJoin(ruleSetVersions, eq(ruleSetVersions.id, events.ruleSetVersionId))
    .where(eq(events.id, eventId))
    .limit(1);
  if (!row) return null;
  let ruleSet = parsedVersions.get(row.ruleSetVersionId);
  if (!ruleSet) {
    ruleSet = ruleSetSchema.parse(row.body);
    parsedVersions.set(row.ruleSetVersionId, ruleSet);
  }
  return {
    eventId,
    eventDate: row.eventDate,
    timeZone: row.timeZone,
    unitSystem: row.unitSystem,
    ruleSetVersionId: row.ruleSetVersionId,
    ruleSet,
  };
}
