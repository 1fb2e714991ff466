import "server-only";
import { v7 as uuidv7 } from "uuid";
import { clock } from "../../lib/clock";
import { getDb } from "../client";
import { uploads } from "../schema";

/** Note an uploaded object (once: a repeated upload of the same key is ignored). */
export async function recordUpload(row: {
  eventId: string;
  entryId: string;
  recordId: string;
  bucket: string;
  objectKey: string;
  contentType: string;
  byteSize: number;
  sha256: string;
  uploadedBy: string;
}): Promise<void> {
  await getDb()
    .insert(uploads)
    .ignore()
    .values({ id: uuidv7(), kind: "photo", ...row, createdAt: clock.now() });
}
