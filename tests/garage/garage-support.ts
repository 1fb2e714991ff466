import { ListObjectsV2Command, S3Client } from "@aws-sdk/client-s3";
import sharp from "sharp";
import type { HttpSession } from "../support/http-session";
import { queryTestDb } from "../support/query-test-db";
import { testPorts } from "../support/test-env";

/** The test S3 fake through the same SDK the app uses. */
const s3 = new S3Client({
  endpoint: `http://127.0.0.1:${testPorts.s3}`,
  region: "us-east-1",
  forcePathStyle: true,
  credentials: { accessKeyId: "S3RVER", secretAccessKey: "S3RVER" },
});

/** How many objects the uploads bucket holds under a car's prefix (every page of the listing). */
export async function countCarObjects(carId: string): Promise<number> {
  let count = 0;
  let token: string | undefined;
  do {
    const page = await s3.send(
      new ListObjectsV2Command({
        Bucket: "plumbline-uploads",
        Prefix: `cars/${carId}/`,
        ContinuationToken: token,
      }),
    );
    count += page.KeyCount ?? 0;
    token = page.IsTruncated ? page.NextContinuationToken : undefined;
  } while (token);
  return count;
}

/** How many `car_files` rows a car has (current and replaced). */
export async function countCarFileRows(databaseUrl: string, carId: string): Promise<number> {
  const [row] = await queryTestDb<{ n: number }>(
    databaseUrl,
    "select count(*) as n from car_files where car_id = ?",
    [carId],
  );
  return Number(row?.n ?? 0);
}

/** A JPEG of the given stored size, with an EXIF orientation tag when asked. */
export async function makeJpeg(width: number, height: number, orientation?: number) {
  let image = sharp({
    create: { width, height, channels: 3, background: { r: 30, g: 90, b: 160 } },
  }).jpeg({ quality: 90 });
  if (orientation) image = image.withMetadata({ orientation });
  return new Uint8Array(await image.toBuffer());
}

/** POST a file to a car as the multipart form the garage sends. */
export function uploadCarFile(
  session: HttpSession,
  carId: string,
  kind: string,
  bytes: Uint8Array,
  name: string,
  type: string,
) {
  const form = new FormData();
  form.set("kind", kind);
  form.set("file", new File([bytes as Uint8Array<ArrayBuffer>], name, { type }));
  return session.fetch(`/api/cars/${carId}/files`, { method: "POST", body: form });
}

/** POST/PATCH JSON. */
export function sendJson(session: HttpSession, method: string, path: string, body: unknown) {
  return session.fetch(path, {
    method,
    headers: { "content-type": "application/json" },
    body: JSON.stringify(body),
  });
}

/** Take out cars a test made, with their files' rows (their objects are under cars/<id>/). */
export async function removeCars(databaseUrl: string, carIds: string[]) {
  if (carIds.length === 0) return;
  const marks = carIds.map(() => "?").join(",");
  await queryTestDb(databaseUrl, `delete from car_files where car_id in (${marks})`, carIds);
  await queryTestDb(databaseUrl, `delete from cars where id in (${marks})`, carIds);
}
