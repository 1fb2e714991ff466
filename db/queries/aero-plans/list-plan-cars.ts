import "server-only";
import { and, asc, eq, isNull } from "drizzle-orm";
import { getDb } from "../../client";
import { cars } from "../../schema";

/** A person's cars still in use, as the pre-check offers them for saving a plan against. */
export async function listPlanCars({ ownerId }: { ownerId: string }) {
  return getDb()
    .select({
      id: cars.id,
      make: cars.make,
      model: cars.model,
      year: cars.year,
      bodyWidthMm: cars.bodyWidthMm,
      roofHeightMm: cars.roofHeightMm,
    })
    .from(cars)
    .where(and(eq(cars.ownerId, ownerId), isNull(cars.retiredAt)))
    .orderBy(asc(cars.make), asc(cars.model), asc(cars.id));
}
