import "server-only";
import { createHash } from "node:crypto";
import { claimUpload } from "../../db/queries/claim-upload";
import { listEventEntryIds } from "../../db/queries/list-event-entry-ids";
import { listRecordAuthors } from "../../db/queries/list-record-authors";
import { env } from "../env";
import { AppError } from "../errors";
import { putObject } from "../storage/put-object";
import { photoStorageKey } from "./photo-storage-key";
import { sniffImageType } from "./sniff-image-type";
import { MAX_PHOTO_BYTES } from "./upload-schema";

/**
 * Put a tech-line photo in object storage under its record's key and note it in `uploads`. Only
 * JPEG, PNG and WebP files are taken, judged by their bytes, never by their name or stated type.
 * A photo is its record's official's, and stored once: when the record is already on the server
 * only its own official may send the photo, and the first upload of a key decides its bytes (the
 * row is claimed before the object is written); the same bytes again are taken as a retry, other
 * bytes are refused 409.
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
  const record = (
    await listRecordAuthors({ eventId: opts.eventId, recordIds: [opts.recordId] })
  ).get(opts.recordId);
  if (record && (record.officialId !== opts.uploadedBy || record.entryId !== opts.entryId)) {
    throw new AppError(
      "forbidden",
      "This photo belongs to another official's record; only they can send it.",
    );
  }
  const claim = await claimUpload({
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
  if (claim.status === "taken") {
    throw new AppError(
      "conflict",
      "A different photo is already stored for this record. Take a new photo to add another.",
    );
  }
  await putObject({ key: expected, body, contentType });
  return { key: expected, bytes: body.byteLength };
}
