import "server-only";
import { and, eq, sql } from "drizzle-orm";
import { getDb } from "../../client";
import type { Tx } from "../../run-transaction";
import { payments, waivers } from "../../schema";

/** What the sign-on rule reads for one entry: every waiver signed for it (by whom, a minor's
 *  guardian or not yet) and whether a payment of its fee stands paid. */
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
      })
      .from(waivers)
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
  return { waivers: signed, paid: Number(paid?.count ?? 0) > 0 };
}
