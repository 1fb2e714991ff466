import "server-only";
import { and, count, eq, isNull } from "drizzle-orm";
import { v7 as uuidv7 } from "uuid";
import { clock } from "../../../lib/clock";
import type { WingPlan } from "../../../lib/scrutineer/aero/wing-plan-schema";
import { getDb } from "../../client";
import { aeroPlans, auditLog, cars } from "../../schema";

/** How many plans one person may keep. */
export const MAX_AERO_PLANS_PER_OWNER = 100;

/**
 * Saves a wing plan against one of the owner's own cars still in use. The car is looked up with
 * the owner in the same query, so an id of someone else's car saves nothing.
 * @returns the new plan's id, or why nothing was saved
 */
export async function saveAeroPlan({
  ownerId,
  carId,
  name,
  plan,
}: {
  ownerId: string;
  carId: string;
  name: string;
  plan: WingPlan;
}): Promise<{ ok: true; id: string } | { ok: false; why: "no-such-car" | "too-many" }> {
  const id = uuidv7();
  const now = clock.now();
  return getDb().transaction(async (tx) => {
    const [car] = await tx
      .select({ id: cars.id })
      .from(cars)
      .where(and(eq(cars.id, carId), eq(cars.ownerId, ownerId), isNull(cars.retiredAt)))
      .limit(1)
      .for("update");
    if (!car) return { ok: false, why: "no-such-car" } as const;
    const [kept] = await tx
      .select({ n: count() })
      .from(aeroPlans)
      .where(eq(aeroPlans.ownerId, ownerId));
    if ((kept?.n ?? 0) >= MAX_AERO_PLANS_PER_OWNER) return { ok: false, why: "too-many" } as const;
    await tx
      .insert(aeroPlans)
      .values({ id, ownerId, carId, name, plan, createdAt: now, updatedAt: now });
    await tx.insert(auditLog).values({
      actorId: ownerId,
      action: "aero-plan.save",
      subjectType: "aero-plan",
      subjectId: id,
      detail: { carId },
      createdAt: now,
    });
    return { ok: true, id } as const;
  });
}
