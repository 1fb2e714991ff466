import "server-only";
import { and, eq, sql } from "drizzle-orm";
import { getDb } from "../client";
import { payments, waivers } from "../schema";

/** Per entry of an event: whether a waiver is signed (and co-signed for a minor) and the fee paid. */
export async function listRegistrationStatus({ eventId }: { eventId: string }) {
  const db = getDb();
  const [waiverRows, paymentRows] = await Promise.all([
    db
      .select({
        entryId: waivers.entryId,
        signed: sql<number>`count(*)`,
        complete: sql<number>`sum(case when ${waivers.isMinor} = 0 or ${waivers.guardianSignedAt} is not null then 1 else 0 end)`,
      })
      .from(waivers)
      .where(eq(waivers.eventId, eventId))
      .groupBy(waivers.entryId),
    db
      .select({ entryId: payments.entryId })
      .from(payments)
      .where(and(eq(payments.eventId, eventId), eq(payments.status, "paid"))),
  ]);
  const status = new Map<
    string,
    { waiver: "signed" | "needs-guardian" | "missing"; paid: boolean }
  >();
  for (const w of waiverRows) {
    status.set(w.entryId, {
      waiver: Number(w.complete) > 0 ? "signed" : "needs-guardian",
      paid: false,
    });
  }
  for (const p of paymentRows) {
    status.set(p.entryId, { waiver: status.get(p.entryId)?.waiver ?? "missing", paid: true });
  }
  return status;
}
