import "server-only";
import { and, eq, isNull } from "drizzle-orm";
import { clock } from "../../lib/clock";
import { AppError } from "../../lib/errors";
import { getDb } from "../client";
import { auditLog, passes } from "../schema";

/**
 * Revoke one pass of an event, with the reason and who did it (and an audit-log row), in one
 * transaction. Revoking twice keeps the first revocation. Revoking does not bar the entry: the
 * entrant's pass page signs a fresh pass next time; to bar an entry, withdraw it.
 * @returns whether this call revoked it (false when it was already revoked)
 */
export async function revokePass({
  eventId,
  passId,
  reason,
  revokedBy,
  now = clock.now(),
}: {
  eventId: string;
  passId: string;
  reason: string;
  revokedBy: string;
  now?: Date;
}): Promise<{ revoked: boolean }> {
  return getDb().transaction(async (tx) => {
    const [pass] = await tx
      .select({ id: passes.id, entryId: passes.entryId, revokedAt: passes.revokedAt })
      .from(passes)
      .where(and(eq(passes.id, passId), eq(passes.eventId, eventId)))
      .for("update");
    if (!pass) throw new AppError("not_found", "There is no such pass in this event.");
    if (pass.revokedAt) return { revoked: false };
    await tx
      .update(passes)
      .set({ revokedAt: now, revokedReason: reason, revokedBy })
      .where(and(eq(passes.id, passId), isNull(passes.revokedAt)));
    await tx.insert(auditLog).values({
      eventId,
      actorId: revokedBy,
      action: "pass.revoke",
      subjectType: "pass",
      subjectId: passId,
      detail: { entryId: pass.entryId, reason },
      createdAt: now,
    });
    return { revoked: true };
  });
}
