import "server-only";
import { and, eq, or } from "drizzle-orm";
import { getDb } from "../client";
import { cars, entries } from "../schema";

/** True when the user drives, co-drives or owns the car of this entry. */
export async function isOwnEntry({
  entryId,
  userId,
}: {
  entryId: string;
  userId: string;
}): Promise<boolean> {
  const rows = await getDb()
    .select({ id: entries.id })
    .from(entries)
    .innerJoin(cars, eq(cars.id, entries.carId))
    .where(
      and(
        eq(entries.id, entryId),
        or(eq(entries.driverId, userId), eq(entries.coDriverId, userId), eq(cars.ownerId, userId)),
      ),
    )
    .limit(1);
  return rows.length > 0;
}
