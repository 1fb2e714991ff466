import { clock } from "../../lib/clock";
import "server-only";
import { and, eq } from "drizzle-orm";
import { v7 as uuidv7 } from "uuid";
import { getDb } from "../client";
import { uploads } from "../schema";

/** What claiming an object key found: a new claim, the same upload again, or another one. */
export type UploadClaim =
  | { status: "new" }
  | { status: "same" }
  | { status: "taken"; uploadedBy: string; sha256: string | null };

/**
 * Note an upload before its bytes are stored, so the first upload of a key decides it for good:
 * the unique (bucket, object key) row is inserted once; a later upload is the same one again
 * only when the same person sends the same bytes (a retry after a lost answer).
 */
export async function claimUpload(row: {
  eventId: string;
  entryId: string;
  recordId: string;
  bucket: string;
  objectKey: string;
  contentType: string;
  byteSize: number;
  sha256: string;
  uploadedBy: string;
}): Promise<UploadClaim> {
  const db = getDb();
  const [result] = await db
    .insert(uploads)
    .ignore()
    .values({ id: uuidv7(), kind: "photo", ...row, createdAt: clock.now() });
  if (result.affectedRows === 1) return { status: "new" };
  const [existing] = await db
    .select({ uploadedBy: uploads.uploadedBy, sha256: uploads.sha256 })
    .from(uploads)
    .where(and(eq(uploads.bucket, row.bucket), eq(uploads.objectKey, row.objectKey)))
    .limit(1);
  if (!existing) return { status: "new" };
  if (existing.uploadedBy === row.uploadedBy && existing.sha256 === row.sha256) {
    return { status: "same" };
  }
  return { status: "taken", uploadedBy: existing.uploadedBy, sha256: existing.sha256 };
}
