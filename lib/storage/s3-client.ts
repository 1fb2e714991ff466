import "server-only";
import { S3Client } from "@aws-sdk/client-s3";
import { env } from "../env";

// The AWS S3 SDK, pointed at the local S3 fake in the demo and tests (path-style addressing).
const globalForS3 = globalThis as unknown as { plumblineS3?: S3Client };

export function getS3Client(): S3Client {
  globalForS3.plumblineS3 ??= new S3Client({
    endpoint: env.S3_ENDPOINT,
    region: env.S3_REGION,
    forcePathStyle: true,
    credentials: { accessKeyId: env.S3_ACCESS_KEY_ID, secretAccessKey: env.S3_SECRET_ACCESS_KEY },
  });
  return globalForS3.plumblineS3;
}
