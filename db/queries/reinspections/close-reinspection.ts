import "server-only";
import { and, eq, gt, isNull, sql } from "drizzle-orm";
import { AppError } from "../../../lib/errors";
import type { Tx } from "../../run-transaction";
import { records, reinspections } from "../../schema";

/**
 * Close an open re-inspection (inside the caller's transaction) — only when a scrutineer has
 * recorded something on the car since it was asked for, so "looked at again" is on the tech sheet.
 * @returns the entry it was about
 */
export async function closeReinspection(
  tx: Tx,
  {
    eventId,
    reinspectionId,
    closedBy,
    closedAt,
    note,
  }: { eventId: string; reinspectionId: string; closedBy: string; closedAt: Date; note: string },
): Promise<string> {
  const [open] = await tx
    .select({ entryId: reinspections.entryId, askedAt: reinspections.askedAt })
    .from(reinspections)
    .where(
      and(
        eq(reinspections.id, reinspectionId),
        eq(reinspections.eventId, eventId),
        isNull(reinspections.closedAt),
      ),
    )
    .for("update");
  if (!open) throw new AppError("not_found", "That re-inspection is not open.");
  const [since] = await tx
    .select({ n: sql<number>`count(*)` })
    .from(records)
    .where(
      and(
        eq(records.eventId, eventId),
        eq(records.entryId, open.entryId),
        gt(records.receivedAt, open.askedAt),
      ),
    );
  if (Number(since?.n ?? 0) === 0) {
    throw new AppError(
      "conflict",
      "Nothing has been recorded on this car since the re-inspection was asked for. A scrutineer records what they found on the car card first.",
    );
  }
  await tx
    .update(reinspections)
    .set({ closedAt, closedBy, closingNote: note })
    .where(eq(reinspections.id, reinspectionId));
  return open.entryId;
}
