import "server-only";
import { getCarOwner } from "../../db/queries/get-car-owner";
import { AppError } from "../errors";

/** The caller's own car, or a refusal: 404 when there is no such car, 403 when it is someone
 *  else's (ids from the browser are never trusted). */
export async function getOwnCar({ carId, userId }: { carId: string; userId: string }) {
  const car = await getCarOwner({ carId });
  if (!car) throw new AppError("not_found", "No such car.");
  if (car.ownerId !== userId) throw new AppError("forbidden", "That car is not in your garage.");
  return car;
}
