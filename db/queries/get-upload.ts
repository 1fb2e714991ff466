import "server-only";
import { and, eq } from "drizzle-orm";
import { getDb } from "../client";
import { uploads } from "../schema";

/** The row noting an uploaded object, or null. */
export async function getUpload({
  bucket,
  objectKey,
}: {
  bucket: string;
  objectKey: string;
}): Promise<{ uploadedBy: string; sha256: string | null; contentType: string } | null> {
  const [row] = await getDb()
    .select({
      uploadedBy: uploads.uploadedBy,
      sha256: uploads.sha256,
      contentType: uploads.contentType,
    })
    .from(uploads)
    .where(and(eq(uploads.bucket, bucket), eq(uploads.objectKey, objectKey)))
    .limit(1);
  return row ?? null;
}
