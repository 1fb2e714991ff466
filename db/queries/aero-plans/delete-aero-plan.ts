import "server-only";
import { and, eq } from "drizzle-orm";
import { clock } from "../../../lib/clock";
import { getDb } from "../../client";
import { aeroPlans, auditLog } from "../../schema";

/** Deletes one of the owner's own plans; someone else's plan is left alone. */
export async function deleteAeroPlan({
  ownerId,
  planId,
}: {
  ownerId: string;
  planId: string;
}): Promise<{ deleted: boolean }> {
  return getDb().transaction(async (tx) => {
    const [result] = await tx
      .delete(aeroPlans)
      .where(and(eq(aeroPlans.id, planId), eq(aeroPlans.ownerId, ownerId)));
    const deleted = result.affectedRows > 0;
    if (deleted) {
      await tx.insert(auditLog).values({
        actorId: ownerId,
        action: "aero-plan.delete",
        subjectType: "aero-plan",
        subjectId: planId,
        detail: null,
        createdAt: clock.now(),
      });
    }
    return { deleted };
  });
}
