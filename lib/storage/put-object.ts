import "server-only";
import { PutObjectCommand } from "@aws-sdk/client-s3";
import { env } from "../env";
import { getS3Client } from "./s3-client";

/** Store bytes in the uploads bucket under `key` (a second put of the same key replaces it). */
export async function putObject(opts: {
  key: string;
  body: Uint8Array;
  contentType: string;
}): Promise<void> {
  await getS3Client().send(
    new PutObjectCommand({
      Bucket: env.S3_BUCKET,
      Key: opts.key,
      Body: opts.body,
      ContentType: opts.contentType,
    }),
  );
}
