import "server-only";
import { getCarOwner } from "../../db/queries/get-car-owner";
import { getEventRoles } from "../../db/queries/get-event-roles";
import { listCarEventIds } from "../../db/queries/list-car-event-ids";
import { can } from "../auth/permissions";
import { AppError } from "../errors";

/**
 * Who may see a car's photos and dyno sheet: its owner, and an official (who may read entries)
 * of an event the car is entered in. Anyone else is refused (403); no such car is 404.
 */
export async function assertMaySeeCarFiles({
  carId,
  userId,
}: {
  carId: string;
  userId: string;
}): Promise<void> {
  const car = await getCarOwner({ carId });
  if (!car) throw new AppError("not_found", "No such car.");
  if (car.ownerId === userId) return;
  for (const eventId of await listCarEventIds({ carId })) {
    const roles = await getEventRoles({ eventId, userId });
    if (can(roles, "entries.read")) return;
  }
  throw new AppError(
    "forbidden",
    "Only the car's owner and the officials of its events see its files.",
  );
}
