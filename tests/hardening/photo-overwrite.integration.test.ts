// Attack: a scrutineer uploads new bytes under another official's photo record (or their own
// again), so the stored photo no longer matches what was recorded. A photo is its record's
// official's and is stored once; the photo route checks the bytes against the recorded hash.
import { PutObjectCommand, S3Client } from "@aws-sdk/client-s3";
import { PNG } from "pngjs";
import { v7 as uuidv7 } from "uuid";
import { afterAll, beforeAll, describe, expect, inject, it } from "vitest";
import { photoStorageKey } from "@/lib/tech/photo-storage-key";
import { demo } from "../support/demo-accounts";
import { HttpSession } from "../support/http-session";
import { postSync } from "../support/post-sync";
import { queryTestDb } from "../support/query-test-db";
import { makeScratchEntries, removeScratchEntries } from "../support/scratch-entries";
import { techFixtures } from "../support/tech-fixtures";
import { testPorts } from "../support/test-env";

const appUrl = inject("appUrl");
const databaseUrl = inject("databaseUrl");

let fx: Awaited<ReturnType<typeof techFixtures>>;
let sam: HttpSession;
let alex: HttpSession;
let samId: string;
let entryId = "";
afterAll(() => removeScratchEntries(databaseUrl, [entryId]));

/** A small real PNG (pngjs, npm) whose pixels are `shade`: different shades, different bytes. */
function png(shade: number): Uint8Array<ArrayBuffer> {
  const image = new PNG({ width: 8, height: 6 });
  image.data.fill(shade);
  return new Uint8Array(PNG.sync.write(image));
}

function upload(session: HttpSession, recordId: string, bytes: Uint8Array<ArrayBuffer>) {
  const form = new FormData();
  form.set("recordId", recordId);
  form.set("entryId", entryId);
  form.set("storageKey", photoStorageKey({ eventId: fx.eventId, entryId, recordId }));
  form.set("file", new Blob([bytes], { type: "image/png" }), "wing.png");
  return session.fetch(`/api/events/${fx.eventId}/uploads`, { method: "POST", body: form });
}

const photoRecord = (recordId: string) => ({
  id: recordId,
  kind: "photo",
  entryId,
  officialId: samId,
  deviceId: "phone-sam",
  deviceTime: new Date().toISOString(),
  payload: { storageKey: photoStorageKey({ eventId: fx.eventId, entryId, recordId }) },
});

const uploadRows = async (recordId: string) =>
  queryTestDb<{ sha256: string; uploaded_by: string }>(
    databaseUrl,
    "select sha256, uploaded_by from uploads where record_id = ?",
    [recordId],
  );

beforeAll(async () => {
  fx = await techFixtures(databaseUrl);
  sam = new HttpSession(appUrl);
  await sam.signInWithPassword(demo.scrutineer, demo.password);
  alex = new HttpSession(appUrl);
  await alex.signInWithPassword(demo.scrutineer2, demo.password);
  samId = await fx.userId(demo.scrutineer);
  // A car of this file's own, so what it writes changes no car another file reads.
  entryId = (await makeScratchEntries(databaseUrl, fx.eventId, 1))[0] ?? "";
});

describe("a photo cannot be overwritten", () => {
  it("refuses another official's upload under a photo record already synced", async () => {
    const recordId = uuidv7();
    expect((await upload(sam, recordId, png(10))).status).toBe(201);
    const synced = await postSync(sam, fx.eventId, "phone-sam", [photoRecord(recordId)]);
    expect(synced.status).toBe(200);
    const before = await uploadRows(recordId);
    const response = await upload(alex, recordId, png(250));
    expect(response.status).toBe(403);
    expect(((await response.json()) as { error: { message: string } }).error.message).toMatch(
      /another official's record/,
    );
    expect(await uploadRows(recordId)).toEqual(before);
    const photo = await sam.fetch(`/api/events/${fx.eventId}/photos/${recordId}?entry=${entryId}`);
    expect(photo.status).toBe(200);
    expect(new Uint8Array(await photo.arrayBuffer())).toEqual(png(10));
  });

  it("refuses other bytes from the same official with 409, and takes the same bytes again", async () => {
    const recordId = uuidv7();
    expect((await upload(sam, recordId, png(30))).status).toBe(201);
    const again = await upload(sam, recordId, png(30)); // a retry after a lost answer
    expect(again.status).toBe(201);
    const other = await upload(sam, recordId, png(99));
    expect(other.status).toBe(409);
    expect(await uploadRows(recordId)).toHaveLength(1);
  });

  it("refuses another official's upload before the record is synced (the first upload decides)", async () => {
    const recordId = uuidv7();
    expect((await upload(sam, recordId, png(40))).status).toBe(201);
    expect((await upload(alex, recordId, png(41))).status).toBe(409);
    const [row] = await uploadRows(recordId);
    expect(row?.uploaded_by).toBe(samId);
  });

  it("will not show a photo whose stored bytes no longer match the recorded hash", async () => {
    const recordId = uuidv7();
    expect((await upload(sam, recordId, png(60))).status).toBe(201);
    // Someone with access to the bucket changes the object behind Plumbline's back.
    const s3 = new S3Client({
      endpoint: `http://127.0.0.1:${testPorts.s3}`,
      region: "us-east-1",
      forcePathStyle: true,
      credentials: { accessKeyId: "S3RVER", secretAccessKey: "S3RVER" },
    });
    await s3.send(
      new PutObjectCommand({
        Bucket: "plumbline-uploads",
        Key: photoStorageKey({ eventId: fx.eventId, entryId, recordId }),
        Body: png(61),
        ContentType: "image/png",
      }),
    );
    const photo = await sam.fetch(`/api/events/${fx.eventId}/photos/${recordId}?entry=${entryId}`);
    expect(photo.status).toBe(409);
  });
});
