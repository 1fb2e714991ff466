import "server-only";
import { createHash } from "node:crypto";
import { getUpload } from "../../db/queries/get-upload";
import { env } from "../env";
import { AppError } from "../errors";
import { getObject } from "../storage/get-object";
import { photoStorageKey } from "./photo-storage-key";

/**
 * A tech-line photo's bytes, or null when there is none. The bytes must be the ones noted when
 * the photo was uploaded (their SHA-256): storage that was changed behind Plumbline's back is
 * refused rather than shown as the photo the official took.
 */
export async function loadPhoto(opts: {
  eventId: string;
  entryId: string;
  recordId: string;
}): Promise<{ body: Uint8Array; contentType: string } | null> {
  const key = photoStorageKey(opts);
  const upload = await getUpload({ bucket: env.S3_BUCKET, objectKey: key });
  if (!upload) return null;
  const object = await getObject(key);
  if (!object) return null;
  const sha256 = createHash("sha256").update(object.body).digest("hex");
  if (upload.sha256 === null || sha256 !== upload.sha256) {
    console.error("[photo] stored bytes differ from the recorded hash", key);
    throw new AppError(
      "conflict",
      "The stored photo does not match the one recorded; ask the chief scrutineer to look into it.",
    );
  }
  return { body: object.body, contentType: upload.contentType };
}
