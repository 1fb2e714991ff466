import "server-only";
import { createHash } from "node:crypto";
import { v7 as uuidv7 } from "uuid";
import { insertCarFile } from "../../db/queries/insert-car-file";
import { clock } from "../clock";
import { env } from "../env";
import { AppError } from "../errors";
import { deleteObject } from "../storage/delete-object";
import { putObject } from "../storage/put-object";
import { CAR_FILE_KINDS, type CarFileKind, MAX_CAR_FILE_BYTES } from "./car-file-limits";
import { carFileUrl } from "./car-file-url";
import type { CarFileSummary } from "./car-schema";
import { reduceImage } from "./reduce-image";
import { sniffCarFileType } from "./sniff-car-file-type";

const megabytes = (bytes: number) => `${Math.round((bytes / 1024 / 1024) * 10) / 10} MB`;
const EXTENSIONS = {
  "image/jpeg": "jpg",
  "image/png": "png",
  "image/webp": "webp",
  "application/pdf": "pdf",
} as const;

/**
 * Store a photo or the dyno sheet of a car the caller owns (checked before this is called).
 * Everything is judged before anything is stored: the size, what the bytes are (never the name or
 * the stated type), whether that fits the kind (photos are pictures; a dyno sheet is a picture or
 * a PDF) and, for a picture, that it decodes. A picture is stored reduced and without metadata.
 * Then the object, then its row (the file of the same kind it replaces is marked removed); if the
 * row cannot be written the object is taken out again. A refusal stores nothing.
 */
export async function storeCarFile(opts: {
  carId: string;
  kind: CarFileKind;
  file: File;
  uploadedBy: string;
}): Promise<CarFileSummary> {
  const what = CAR_FILE_KINDS[opts.kind];
  if (opts.file.size === 0) {
    throw new AppError("invalid_input", `The ${what.toLowerCase()} is an empty file.`, {
      file: ["Attach the file again: this one has nothing in it"],
    });
  }
  if (opts.file.size > MAX_CAR_FILE_BYTES) {
    const message = `That file is ${megabytes(opts.file.size)}; the most a car's file may be is ${megabytes(MAX_CAR_FILE_BYTES)}. Send a smaller photo or export the sheet at a lower resolution.`;
    throw new AppError("invalid_input", message, { file: [message] });
  }
  const original = new Uint8Array(await opts.file.arrayBuffer());
  const type = sniffCarFileType(original);
  if (type === null) {
    const allowed =
      opts.kind === "dyno-sheet"
        ? "a PDF or a JPEG, PNG or WebP picture"
        : "a JPEG, PNG or WebP picture";
    const message = `This file is not ${allowed}: it was judged by what is inside it, not by its name.`;
    throw new AppError("invalid_input", message, { file: [message] });
  }
  if (type === "application/pdf" && opts.kind !== "dyno-sheet") {
    const message =
      "A photo must be a picture (JPEG, PNG or WebP); a PDF belongs under Dyno sheet.";
    throw new AppError("invalid_input", message, { file: [message] });
  }
  const stored =
    type === "application/pdf"
      ? { bytes: original, widthPx: null, heightPx: null }
      : await reduceImage(original, type);
  const id = uuidv7();
  const objectKey = `cars/${opts.carId}/${opts.kind}-${id}.${EXTENSIONS[type]}`;
  const sha256 = createHash("sha256").update(stored.bytes).digest("hex");
  await putObject({ key: objectKey, body: stored.bytes, contentType: type });
  try {
    await insertCarFile({
      file: {
        id,
        carId: opts.carId,
        kind: opts.kind,
        bucket: env.S3_BUCKET,
        objectKey,
        contentType: type,
        byteSize: stored.bytes.byteLength,
        widthPx: stored.widthPx,
        heightPx: stored.heightPx,
        sha256,
        uploadedBy: opts.uploadedBy,
      },
      now: clock.now(),
    });
  } catch (error) {
    await deleteObject(objectKey).catch(() => undefined);
    throw error;
  }
  return {
    id,
    kind: opts.kind,
    contentType: type,
    byteSize: stored.bytes.byteLength,
    widthPx: stored.widthPx,
    heightPx: stored.heightPx,
    url: carFileUrl({ carId: opts.carId, fileId: id }),
  };
}
