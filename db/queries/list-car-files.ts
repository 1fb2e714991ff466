import "server-only";
import { and, asc, inArray, isNull } from "drizzle-orm";
import { getDb } from "../client";
import { carFiles } from "../schema";

/** The current files (not replaced) of the given cars, oldest first. */
export async function listCarFiles({ carIds }: { carIds: string[] }) {
  if (carIds.length === 0) return [];
  return getDb()
    .select({
      id: carFiles.id,
      carId: carFiles.carId,
      kind: carFiles.kind,
      contentType: carFiles.contentType,
      byteSize: carFiles.byteSize,
      widthPx: carFiles.widthPx,
      heightPx: carFiles.heightPx,
    })
    .from(carFiles)
    .where(and(inArray(carFiles.carId, carIds), isNull(carFiles.removedAt)))
    .orderBy(asc(carFiles.createdAt));
}
