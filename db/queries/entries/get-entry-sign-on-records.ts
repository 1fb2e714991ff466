import "server-only";
import { and, eq, sql } from "drizzle-orm";
import { countsAsMinor } from "../../../lib/waivers/counts-as-minor";
import { getDb } from "../../client";
import type { Tx } from "../../run-transaction";
import { events, payments, users, waivers } from "../../schema";

/** What the sign-on rule reads for one entry: every waiver signed for it (by whom; a minor's —
 *  as signed, or by the signer's date of birth now — with its guardian's acceptance or not yet) and whether a payment of its fee stands paid. */
export async function getEntrySignOnRecords(
  { eventId, entryId }: { eventId: string; entryId: string },
  tx?: Tx,
) {
  const db = tx ?? getDb();
  const [signed, [paid]] = await Promise.all([
    db
      .select({
        signerId: waivers.signerId,
        isMinor: waivers.isMinor,
        guardianSignedAt: waivers.guardianSignedAt,
        dateOfBirth: users.dateOfBirth,
        eventDate: events.eventDate,
      })
      .from(waivers)
      .innerJoin(users, eq(users.id, waivers.signerId))
      .innerJoin(events, eq(events.id, waivers.eventId))
      .where(and(eq(waivers.eventId, eventId), eq(waivers.entryId, entryId))),
    db
      .select({ count: sql<number>`count(*)` })
      .from(payments)
      .where(
        and(
          eq(payments.eventId, eventId),
          eq(payments.entryId, entryId),
          eq(payments.status, "paid"),
        ),
      ),
  ]);
  return {
    waivers: signed.map(({ dateOfBirth, eventDate, ...w }) => ({
      ...w,
      isMinor: countsAsMinor({ signedAsMinor: Boolean(w.isMinor), dateOfBirth, eventDate }),
    })),
    paid: Number(paid?.count ?? 0) > 0,
  };
}
