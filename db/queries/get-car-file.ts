import "server-only";
import { and, eq } from "drizzle-orm";
import { getDb } from "../client";
import { carFiles } from "../schema";

/** One file of a car (current or replaced), or null. */
export async function getCarFile({ carId, fileId }: { carId: string; fileId: string }) {
  const [row] = await getDb()
    .select({
      objectKey: carFiles.objectKey,
      contentType: carFiles.contentType,
      sha256: carFiles.sha256,
      kind: carFiles.kind,
    })
    .from(carFiles)
    .where(and(eq(carFiles.id, fileId), eq(carFiles.carId, carId)))
    .limit(1);
  return row ?? null;
}
