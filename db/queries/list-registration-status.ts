import "server-only";
import { and, eq } from "drizzle-orm";
import {
  type EntryWaiverState,
  entryWaiverState,
  type WaiverRow,
} from "../../lib/entries/entry-waiver-state";
import { countsAsMinor } from "../../lib/waivers/counts-as-minor";
import { getDb } from "../client";
import { entries, events, payments, users, waivers } from "../schema";

/**
 * Per entry of an event: whether the waiver is complete for every driver (the driver and an
 * accepted co-driver each signed, a minor's co-signed by a guardian) and the fee paid. Entries
 * with nothing signed and nothing paid are left out (the callers read them as missing/unpaid).
 */
export async function listRegistrationStatus({ eventId }: { eventId: string }) {
  const db = getDb();
  const [entryRows, waiverRows, paymentRows] = await Promise.all([
    db
      .select({ entryId: entries.id, driverId: entries.driverId, coDriverId: entries.coDriverId })
      .from(entries)
      .where(eq(entries.eventId, eventId)),
    db
      .select({
        entryId: waivers.entryId,
        signerId: waivers.signerId,
        isMinor: waivers.isMinor,
        guardianSignedAt: waivers.guardianSignedAt,
        dateOfBirth: users.dateOfBirth,
        eventDate: events.eventDate,
      })
      .from(waivers)
      .innerJoin(users, eq(users.id, waivers.signerId))
      .innerJoin(events, eq(events.id, waivers.eventId))
      .where(eq(waivers.eventId, eventId)),
    db
      .select({ entryId: payments.entryId })
      .from(payments)
      .where(and(eq(payments.eventId, eventId), eq(payments.status, "paid"))),
  ]);
  const signedBy = new Map<string, WaiverRow[]>();
  for (const { dateOfBirth, eventDate, ...w } of waiverRows) {
    const list = signedBy.get(w.entryId) ?? [];
    list.push({
      ...w,
      isMinor: countsAsMinor({ signedAsMinor: Boolean(w.isMinor), dateOfBirth, eventDate }),
    });
    signedBy.set(w.entryId, list);
  }
  const paid = new Set(paymentRows.map((p) => p.entryId));
  const status = new Map<string, { waiver: EntryWaiverState; paid: boolean }>();
  for (const e of entryRows) {
    const signed = signedBy.get(e.entryId) ?? [];
    if (signed.length === 0 && !paid.has(e.entryId)) continue;
    status.set(e.entryId, {
      waiver: entryWaiverState([e.driverId, e.coDriverId], signed),
      paid: paid.has(e.entryId),
    });
  }
  return status;
}
