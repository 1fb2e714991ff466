import "server-only";
import { GetObjectCommand } from "@aws-sdk/client-s3";
import { env } from "../env";
import { getS3Client } from "./s3-client";

/** Read an object from the uploads bucket, or null when it is not there. */
export async function getObject(
  key: string,
): Promise<{ body: Uint8Array; contentType: string } | null> {
  try {
    const out = await getS3Client().send(new GetObjectCommand({ Bucket: env.S3_BUCKET, Key: key }));
    if (!out.Body) return null;
    return {
      body: await out.Body.transformToByteArray(),
      contentType: out.ContentType ?? "application/octet-stream",
    };
  } catch (error) {
    if ((error as { name?: string }).name === "NoSuchKey") return null;
    throw error;
  }
}
