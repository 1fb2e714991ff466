import "server-only";
import { eq } from "drizzle-orm";
import { getDb } from "../client";
import { cars } from "../schema";

/** Who owns a car, and whether it is retired; null when there is no such car. */
export async function getCarOwner({
  carId,
}: {
  carId: string;
}): Promise<{ ownerId: string; retiredAt: Date | null } | null> {
  const [row] = await getDb()
    .select({ ownerId: cars.ownerId, retiredAt: cars.retiredAt })
    .from(cars)
    .where(eq(cars.id, carId))
    .limit(1);
  return row ?? null;
}
