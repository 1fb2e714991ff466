import "server-only";
import { desc, eq } from "drizzle-orm";
import { getDb } from "../../client";
import type { Tx } from "../../run-transaction";
import { cars, entries, events, payments, users } from "../../schema";

/** An entry with what paying for it or withdrawing it needs: the event's fee, currency, date,
 *  zone and refund policy, who drives and owns it, and its payments newest first; or null.
 *  With `forUpdate` (inside a transaction) the entry's row is locked. */
export async function getEntryPaymentFacts(
  { entryId, forUpdate = false }: { entryId: string; forUpdate?: boolean },
  tx?: Tx,
) {
  const db = tx ?? getDb();
  const query = db
    .select({
      entryId: entries.id,
      eventId: entries.eventId,
      carNumber: entries.carNumber,
      entryStatus: entries.status,
      withdrawnAt: entries.withdrawnAt,
      driverId: entries.driverId,
      ownerId: cars.ownerId,
      driverEmail: users.email,
      eventName: events.name,
      eventSlug: events.slug,
      eventDate: events.eventDate,
      eventStatus: events.status,
      timeZone: events.timeZone,
      entryFeeMinor: events.entryFeeMinor,
      currency: events.currency,
      refundPolicy: events.refundPolicy,
    })
    .from(entries)
    .innerJoin(events, eq(events.id, entries.eventId))
    .innerJoin(cars, eq(cars.id, entries.carId))
    .innerJoin(users, eq(users.id, entries.driverId))
    .where(eq(entries.id, entryId))
    .limit(1);
  const [row] = forUpdate ? await query.for("update") : await query;
  if (!row) return null;
  const list = await db
    .select({
      id: payments.id,
      providerRef: payments.providerRef,
      amountMinor: payments.amountMinor,
      currency: payments.currency,
      status: payments.status,
      paymentRef: payments.paymentRef,
      paidAt: payments.paidAt,
      refundedMinor: payments.refundedMinor,
      createdAt: payments.createdAt,
    })
    .from(payments)
    .where(eq(payments.entryId, entryId))
    .orderBy(desc(payments.createdAt), desc(payments.id));
  return { ...row, payments: list };
}

export type EntryPaymentFacts = NonNullable<Awaited<ReturnType<typeof getEntryPaymentFacts>>>;
export type EntryPayment = EntryPaymentFacts["payments"][number];
