import "server-only";
import { v7 as uuidv7 } from "uuid";
import type { CarFields } from "../../lib/cars/car-schema";
import { clock } from "../../lib/clock";
import { getDb } from "../client";
import { auditLog, cars } from "../schema";

/** Add a car to a person's garage (and the audit log) in one transaction. */
export async function createCar({
  ownerId,
  car,
}: {
  ownerId: string;
  car: CarFields;
}): Promise<{ id: string }> {
  const id = uuidv7();
  const now = clock.now();
  const { bodyWidth, roofHeight, ...rest } = car;
  await getDb().transaction(async (tx) => {
    await tx.insert(cars).values({
      id,
      ownerId,
      ...rest,
      notes: car.notes || null,
      bodyWidthMm: bodyWidth,
      roofHeightMm: roofHeight,
      createdAt: now,
      updatedAt: now,
    });
    await tx.insert(auditLog).values({
      actorId: ownerId,
      action: "car.create",
      subjectType: "car",
      subjectId: id,
      detail: { make: car.make, model: car.model },
      createdAt: now,
    });
  });
  return { id };
}
