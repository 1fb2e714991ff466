import "server-only";
import { and, eq, isNull } from "drizzle-orm";
import { getDb } from "../client";
import { auditLog, type carFileKinds, carFiles } from "../schema";

/** A stored file's row, as `insertCarFile` writes it. */
export type NewCarFile = {
  id: string;
  carId: string;
  kind: (typeof carFileKinds)[number];
  bucket: string;
  objectKey: string;
  contentType: string;
  byteSize: number;
  widthPx: number | null;
  heightPx: number | null;
  sha256: string;
  uploadedBy: string;
};

/**
 * Note a car's new file, in one transaction: the file of the same kind it replaces gets
 * `removedAt` (kept, so what an official saw before can still be traced), then the new row and
 * the audit line.
 */
export async function insertCarFile({ file, now }: { file: NewCarFile; now: Date }) {
  await getDb().transaction(async (tx) => {
    await tx
      .update(carFiles)
      .set({ removedAt: now })
      .where(
        and(
          eq(carFiles.carId, file.carId),
          eq(carFiles.kind, file.kind),
          isNull(carFiles.removedAt),
        ),
      );
    await tx.insert(carFiles).values({ ...file, createdAt: now, removedAt: null });
    await tx.insert(auditLog).values({
      actorId: file.uploadedBy,
      action: "car.file",
      subjectType: "car",
      subjectId: file.carId,
      detail: { kind: file.kind, fileId: file.id, bytes: file.byteSize },
      createdAt: now,
    });
  });
}
