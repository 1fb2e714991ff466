import "server-only";
import { and, eq } from "drizzle-orm";
import { entryWaiverState } from "../../lib/entries/entry-waiver-state";
import { classNamesFromRuleSet } from "../../lib/passes/class-names-from-rule-set";
import type { PassReadiness } from "../../lib/passes/pass-blockers";
import { getDb } from "../client";
import { entries, events, ruleSetVersions, venues, verdicts } from "../schema";
import { getEntrySignOnRecords } from "./entries/get-entry-sign-on-records";

/** An entry with what its pass shows (car number, declared class, and the class the stored
 *  verdict runs it in) and what decides whether it may have one, or null. The waiver counts as
 *  signed only when every driver's is complete (lib/entries/entry-waiver-state.ts). */
export async function getEntryForPass({ entryId }: { entryId: string }) {
  const db = getDb();
  const [row] = await db
    .select({
      entryId: entries.id,
      eventId: entries.eventId,
      carNumber: entries.carNumber,
      declaredClass: entries.declaredClass,
      entryStatus: entries.status,
      driverId: entries.driverId,
      coDriverId: entries.coDriverId,
      eventName: events.name,
      eventDate: events.eventDate,
      timeZone: events.timeZone,
      venueName: venues.name,
      ruleSetBody: ruleSetVersions.body,
      verdictStatus: verdicts.status,
      finalClass: verdicts.finalClass,
    })
    .from(entries)
    .innerJoin(events, eq(events.id, entries.eventId))
    .innerJoin(venues, eq(venues.id, events.venueId))
    .innerJoin(ruleSetVersions, eq(ruleSetVersions.id, events.ruleSetVersionId))
    .leftJoin(
      verdicts,
      and(eq(verdicts.eventId, entries.eventId), eq(verdicts.entryId, entries.id)),
    )
    .where(eq(entries.id, entryId))
    .limit(1);
  if (!row) return null;
  const { waivers: signed, paid } = await getEntrySignOnRecords({ eventId: row.eventId, entryId });
  const { ruleSetBody, verdictStatus, driverId, coDriverId, ...rest } = row;
  // Every driver of the entry (the driver and an accepted co-driver) signs their own.
  const waiverState: PassReadiness["waiver"] = entryWaiverState([driverId, coDriverId], signed);
  return {
    ...rest,
    verdictStatus: verdictStatus ?? "waiting",
    classNames: classNamesFromRuleSet(ruleSetBody),
    waiver: waiverState,
    paid,
  };
}

export type EntryForPass = NonNullable<Awaited<ReturnType<typeof getEntryForPass>>>;
