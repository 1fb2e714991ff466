import "server-only";
import { and, eq } from "drizzle-orm";
import { clock } from "../../lib/clock";
import { getDb } from "../client";
import { auditLog, cars } from "../schema";

/** Retire an owner's car (kept for its past entries, no longer offered for new ones) or bring it
 *  back; false when the car is not theirs. Returns the time it was retired (null when back). */
export async function setCarRetired({
  ownerId,
  carId,
  retired,
}: {
  ownerId: string;
  carId: string;
  retired: boolean;
}): Promise<{ found: false } | { found: true; retiredAt: Date | null }> {
  const now = clock.now();
  const retiredAt = retired ? now : null;
  return getDb().transaction(async (tx) => {
    const [result] = await tx
      .update(cars)
      .set({ retiredAt, updatedAt: now })
      .where(and(eq(cars.id, carId), eq(cars.ownerId, ownerId)));
    if (result.affectedRows === 0) return { found: false as const };
    await tx.insert(auditLog).values({
      actorId: ownerId,
      action: retired ? "car.retire" : "car.unretire",
      subjectType: "car",
      subjectId: carId,
      detail: {},
      createdAt: now,
    });
    return { found: true as const, retiredAt };
  });
}
