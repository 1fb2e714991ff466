import "server-only";
import { desc, eq } from "drizzle-orm";
import { type WingPlan, wingPlanSchema } from "../../../lib/scrutineer/aero/wing-plan-schema";
import { getDb } from "../../client";
import { aeroPlans, cars } from "../../schema";

/** A saved plan as its owner sees it. */
export type SavedAeroPlan = {
  id: string;
  name: string;
  carId: string;
  carName: string;
  updatedAt: string;
  plan: WingPlan;
};

/** A person's saved wing plans, newest first (a stored plan that no longer parses is left out). */
export async function listAeroPlans({ ownerId }: { ownerId: string }): Promise<SavedAeroPlan[]> {
  const rows = await getDb()
    .select({
      id: aeroPlans.id,
      name: aeroPlans.name,
      carId: aeroPlans.carId,
      make: cars.make,
      model: cars.model,
      year: cars.year,
      updatedAt: aeroPlans.updatedAt,
      plan: aeroPlans.plan,
    })
    .from(aeroPlans)
    .innerJoin(cars, eq(cars.id, aeroPlans.carId))
    .where(eq(aeroPlans.ownerId, ownerId))
    .orderBy(desc(aeroPlans.updatedAt), desc(aeroPlans.id))
    .limit(100);
  return rows.flatMap((r) => {
    const plan = wingPlanSchema.safeParse(r.plan);
    if (!plan.success) return [];
    return [
      {
        id: r.id,
        name: r.name,
        carId: r.carId,
        carName: `${r.year} ${r.make} ${r.model}`,
        updatedAt: r.updatedAt.toISOString(),
        plan: plan.data,
      },
    ];
  });
}
