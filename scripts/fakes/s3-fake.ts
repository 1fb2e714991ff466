// A local stand-in for hosted object storage: s3rver on 127.0.0.1, spoken to with the AWS S3 SDK.
import S3rver from "s3rver";

export type S3Fake = { close: () => Promise<void>; port: number };

/** Start s3rver with the app's bucket, storing objects under `dir`. */
export async function startS3Fake(opts: {
  port: number;
  dir: string;
  bucket: string;
}): Promise<S3Fake> {
  const server = new S3rver({
    port: opts.port,
    address: "127.0.0.1",
    directory: opts.dir,
    silent: true,
    configureBuckets: [{ name: opts.bucket, configs: [] }],
  });
  await server.run();
  return { port: opts.port, close: () => server.close() };
}
