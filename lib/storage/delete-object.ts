import "server-only";
import { DeleteObjectCommand } from "@aws-sdk/client-s3";
import { env } from "../env";
import { getS3Client } from "./s3-client";

/** Remove an object from the uploads bucket (nothing happens when it is not there). */
export async function deleteObject(key: string): Promise<void> {
  await getS3Client().send(new DeleteObjectCommand({ Bucket: env.S3_BUCKET, Key: key }));
}
