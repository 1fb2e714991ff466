import "server-only";
import { createHash } from "node:crypto";
import { listEventEntryIds } from "../../db/queries/list-event-entry-ids";
import { recordUpload } from "../../db/queries/record-upload";
import { env } from "../env";
import { AppError } from "../errors";
import { putObject } from "../storage/put-object";
import { photoStorageKey } from "./photo-storage-key";
import { sniffImageType } from "./sniff-image-type";
import { MAX_PHOTO_BYTES } from "./upload-schema";

/**
 * Put a tech-line photo in object storage under its record's key and note it in `uploads`. Only
 * JPEG, PNG and WebP files are taken, judged by their bytes, never by their name or stated type.
 */
export async function storePhoto(opts: {
  eventId: string;
  entryId: string;
  recordId: string;
  storageKey: string;
  file: File;
  uploadedBy: string;
}): Promise<{ key: string; bytes: number }> {
  const expected = photoStorageKey(opts);
  if (opts.storageKey !== expected) {
    throw new AppError("invalid_input", "The photo's storage key does not match its record.", {
      storageKey: [`expected ${expected}`],
    });
  }
  if (opts.file.size === 0 || opts.file.size > MAX_PHOTO_BYTES) {
    throw new AppError("invalid_input", "The photo is empty or too large.", {
      file: [`Up to ${MAX_PHOTO_BYTES / 1024 / 1024} MB`],
    });
  }
  const body = new Uint8Array(await opts.file.arrayBuffer());
  // The name and the stated type are the sender's say-so; the bytes are what gets stored.
  const contentType = sniffImageType(body);
  if (contentType === null) {
    throw new AppError(
      "invalid_input",
      "This file is not a photo. Take the picture again, or attach a JPEG, PNG or WebP image.",
      { file: ["Attach a JPEG, PNG or WebP image"] },
    );
  }
  const known = await listEventEntryIds({ eventId: opts.eventId, entryIds: [opts.entryId] });
  if (!known.has(opts.entryId))
    throw new AppError("not_found", "That car is not entered in this event.");
  await putObject({ key: expected, body, contentType });
  await recordUpload({
    eventId: opts.eventId,
    entryId: opts.entryId,
    recordId: opts.recordId,
    bucket: env.S3_BUCKET,
    objectKey: expected,
    contentType,
    byteSize: body.byteLength,
    sha256: createHash("sha256").update(body).digest("hex"),
    uploadedBy: opts.uploadedBy,
  });
  return { key: expected, bytes: body.byteLength };
}
