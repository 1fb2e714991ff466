import "server-only";
import { and, eq } from "drizzle-orm";
import type { CarFields } from "../../lib/cars/car-schema";
import { clock } from "../../lib/clock";
import { getDb } from "../client";
import { auditLog, cars } from "../schema";

/** Change an owner's car (and write the audit log) in one transaction; false when the car is not
 *  theirs or not there. Past entries keep pointing at the same car. */
export async function updateCar({
  ownerId,
  carId,
  car,
}: {
  ownerId: string;
  carId: string;
  car: CarFields;
}): Promise<boolean> {
  const now = clock.now();
  const { bodyWidth, roofHeight, ...rest } = car;
  return getDb().transaction(async (tx) => {
    const [result] = await tx
      .update(cars)
      .set({
        ...rest,
        notes: car.notes || null,
        bodyWidthMm: bodyWidth,
        roofHeightMm: roofHeight,
        updatedAt: now,
      })
      .where(and(eq(cars.id, carId), eq(cars.ownerId, ownerId)));
    if (result.affectedRows === 0) return false;
    await tx.insert(auditLog).values({
      actorId: ownerId,
      action: "car.update",
      subjectType: "car",
      subjectId: carId,
      detail: { make: car.make, model: car.model, year: car.year },
      createdAt: now,
    });
    return true;
  });
}
