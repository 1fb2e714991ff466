import { PNG } from "pngjs";
import { v7 as uuidv7 } from "uuid";
import { beforeAll, describe, expect, inject, it } from "vitest";
import { photoStorageKey } from "@/lib/tech/photo-storage-key";
import { readSyncAnswer } from "../support/await-verdicts";
import { demo } from "../support/demo-accounts";
import { HttpSession } from "../support/http-session";
import { postSync } from "../support/post-sync";
import { queryTestDb } from "../support/query-test-db";
import { countRecords, readingRecord, techFixtures } from "../support/tech-fixtures";

const appUrl = inject("appUrl");
const databaseUrl = inject("databaseUrl");

type SyncAnswer = {
  results: { id: string | null; status: string; reason?: string }[];
  verdicts: { entryId: string; status: string }[];
};

let fx: Awaited<ReturnType<typeof techFixtures>>;
let sam: HttpSession;
let alex: HttpSession;
let samId: string;
let alexId: string;
let entryId: string;

async function sync(session: HttpSession, records: unknown[]) {
  const response = await postSync(session, fx.eventId, "test-device", records);
  return {
    status: response.status,
    body: (await readSyncAnswer(session, fx.eventId, response)) as SyncAnswer,
  };
}

const voidOf = (targetRecordId: string, officialId: string, at = new Date()) => ({
  id: uuidv7({ msecs: at.getTime() }),
  kind: "void",
  entryId,
  officialId,
  deviceId: "phone-a",
  deviceTime: at.toISOString(),
  payload: { targetRecordId, reason: "typed 0 instead of 1380" },
});

beforeAll(async () => {
  fx = await techFixtures(databaseUrl);
  sam = new HttpSession(appUrl);
  await sam.signInWithPassword(demo.scrutineer, demo.password);
  alex = new HttpSession(appUrl);
  await alex.signInWithPassword(demo.scrutineer2, demo.password);
  samId = await fx.userId(demo.scrutineer);
  alexId = await fx.userId(demo.scrutineer2);
  // A car of its own, so these records touch no other test's verdict.
  entryId = (await fx.entryNumbers()).at(-3)?.id ?? "";
});

describe("a scrutineer voids their own records (POST /sync)", () => {
  it("stores a void of the scrutineer's own reading, already on the server", async () => {
    const typo = readingRecord({
      entryId,
      officialId: samId,
      deviceId: "phone-a",
      dimension: "wingTopFromGroundMm",
      valueMm: 0,
    });
    expect((await sync(sam, [typo])).body.results[0]?.status).toBe("stored");
    const take = voidOf(typo.id, samId, new Date(Date.now() + 10));
    const { status, body } = await sync(sam, [take]);
    expect(status).toBe(200);
    expect(body.results[0]).toEqual({ id: take.id, status: "stored" });
    expect(await countRecords(databaseUrl, [take.id])).toBe(1);
  });

  it("stores a reading and its void sent together in one batch (offline, then signal)", async () => {
    const typo = readingRecord({
      entryId,
      officialId: samId,
      deviceId: "phone-a",
      dimension: "wingOverhangMm",
      valueMm: 12.3456,
    });
    const take = voidOf(typo.id, samId, new Date(Date.now() + 20));
    const { body } = await sync(sam, [typo, take]);
    expect(body.results.map((r) => r.status)).toEqual(["stored", "stored"]);
  });

  it("refuses a void of another scrutineer's reading, with a reason, and stores nothing", async () => {
    const theirs = readingRecord({
      entryId,
      officialId: alexId,
      deviceId: "phone-b",
      dimension: "wingSpanMm",
      valueMm: 1600,
    });
    expect((await sync(alex, [theirs])).body.results[0]?.status).toBe("stored");
    const attempt = voidOf(theirs.id, samId, new Date(Date.now() + 30));
    const { status, body } = await sync(sam, [attempt]);
    expect(status).toBe(200);
    expect(body.results[0]?.status).toBe("refused");
    expect(body.results[0]?.reason).toBe(
      "You can void only your own records; ask the chief scrutineer to void another official's.",
    );
    expect(await countRecords(databaseUrl, [attempt.id])).toBe(0);

    // The chief scrutineer may.
    const chief = new HttpSession(appUrl);
    await chief.signInWithPassword(demo.chief, demo.password);
    const byChief = voidOf(theirs.id, await fx.userId(demo.chief), new Date(Date.now() + 40));
    expect((await sync(chief, [byChief])).body.results[0]?.status).toBe("stored");
  });

  it("words a refused record in plain language, never the field path or the library's words", async () => {
    const longComment = {
      id: uuidv7(),
      kind: "checklist",
      entryId,
      officialId: samId,
      deviceId: "phone-a",
      deviceTime: new Date().toISOString(),
      payload: { itemId: "battery", result: "fail", comment: "c".repeat(3000) },
    };
    const { body } = await sync(sam, [longComment]);
    expect(body.results[0]?.status).toBe("refused");
    expect(body.results[0]?.reason).toBe(
      "The comment is too long: at most 2000 characters; this one has 3000. Record it again, shorter.",
    );
  });
});

describe("POST /api/events/[eventId]/uploads", () => {
  const upload = async (bytes: Uint8Array<ArrayBuffer>, name: string, type: string) => {
    const recordId = uuidv7();
    const form = new FormData();
    form.set("recordId", recordId);
    form.set("entryId", entryId);
    form.set("storageKey", photoStorageKey({ eventId: fx.eventId, entryId, recordId }));
    form.set("file", new Blob([bytes], { type }), name);
    const response = await sam.fetch(`/api/events/${fx.eventId}/uploads`, {
      method: "POST",
      body: form,
    });
    return { recordId, status: response.status, body: (await response.json()) as unknown };
  };

  it("refuses a file that only claims to be a PNG, with 422 and a plain message", async () => {
    const fake = new TextEncoder().encode("not a picture, just text with a .png name");
    const { recordId, status, body } = await upload(fake, "wing.png", "image/png");
    expect(status).toBe(422);
    expect(body).toMatchObject({
      error: {
        code: "invalid_input",
        message:
          "This file is not a photo. Take the picture again, or attach a JPEG, PNG or WebP image.",
      },
    });
    const rows = await queryTestDb(databaseUrl, "select 1 from uploads where record_id = ?", [
      recordId,
    ]);
    expect(rows).toHaveLength(0);
  });

  it("stores a real PNG and records its type from its bytes", async () => {
    // A picture made with pngjs (npm), sent with a wrong stated type on purpose.
    const png = new PNG({ width: 8, height: 6 });
    png.data.fill(200);
    const { recordId, status } = await upload(
      new Uint8Array(PNG.sync.write(png)),
      "wing.jpg",
      "application/octet-stream",
    );
    expect(status).toBe(201);
    const [row] = await queryTestDb<{ content_type: string }>(
      databaseUrl,
      "select content_type from uploads where record_id = ?",
      [recordId],
    );
    expect(row?.content_type).toBe("image/png");
  });
});
