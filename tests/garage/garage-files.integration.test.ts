// A car's photos and dyno sheet through the real routes and the S3 fake: judged by their bytes,
// size-limited, pictures reduced; a refusal stores nothing (no object, no row); officials of the
// car's event see them, strangers do not.
import sharp from "sharp";
import { afterAll, beforeAll, describe, expect, inject, it } from "vitest";
import { demo } from "../support/demo-accounts";
import { HttpSession } from "../support/http-session";
import { queryTestDb } from "../support/query-test-db";
import {
  countCarFileRows,
  countCarObjects,
  makeJpeg,
  removeCars,
  sendJson,
  uploadCarFile,
} from "./garage-support";

const appUrl = inject("appUrl");
const databaseUrl = inject("databaseUrl");
let owner: HttpSession;
let stranger: HttpSession;
let carId: string;

type FileAnswer = {
  file: { id: string; url: string; widthPx: number | null; heightPx: number | null };
};

beforeAll(async () => {
  owner = new HttpSession(appUrl);
  await owner.signInWithPassword(demo.codriver, demo.password);
  stranger = new HttpSession(appUrl);
  await stranger.signInWithPassword(demo.entrant, demo.password);
  const response = await sendJson(owner, "POST", "/api/cars", {
    make: "Nissan",
    model: "200SX S14",
    year: 1997,
    colour: "Green",
  });
  carId = ((await response.json()) as { car: { id: string } }).car.id;
});
afterAll(() => removeCars(databaseUrl, [carId]));

/** Sends a file that must be refused: 422 with words naming the problem, nothing stored. */
async function expectRefused(
  kind: string,
  bytes: Uint8Array,
  name: string,
  type: string,
  words: RegExp,
) {
  const objects = await countCarObjects(carId);
  const rows = await countCarFileRows(databaseUrl, carId);
  const response = await uploadCarFile(owner, carId, kind, bytes, name, type);
  expect(response.status, name).toBe(422);
  const { error } = (await response.json()) as { error: { message: string } };
  expect(error.message).toMatch(words);
  expect(await countCarObjects(carId)).toBe(objects);
  expect(await countCarFileRows(databaseUrl, carId)).toBe(rows);
}

describe("a car's files", () => {
  it("refuses a file whose bytes are not a picture or PDF, whatever its name", async () => {
    await expectRefused(
      "front",
      new TextEncoder().encode("just some text, honestly"),
      "front.jpg",
      "image/jpeg",
      /not a JPEG, PNG or WebP picture: it was judged by what is inside it/,
    );
    // Source: Microsoft PE format — an executable starts "MZ" (the DOS header).
    const exe = new Uint8Array(4096);
    exe.set([0x4d, 0x5a, 0x90, 0x00, 0x03]);
    await expectRefused("dyno-sheet", exe, "dyno.pdf", "application/pdf", /not a PDF or a JPEG/);
    // Source: ISO 32000-1:2008 §7.5.2 — "%PDF-" starts a PDF: a real PDF, but not a photo.
    await expectRefused(
      "rear",
      new TextEncoder().encode("%PDF-1.4\n%%EOF\n"),
      "rear.pdf",
      "application/pdf",
      /A photo must be a picture/,
    );
    // Bytes that start like a JPEG and are not one.
    await expectRefused(
      "side",
      new Uint8Array([0xff, 0xd8, 0xff, 0xe0, 1, 2, 3, 4, 5]),
      "side.jpg",
      "image/jpeg",
      /could not be read/,
    );
  });

  it("refuses a file over 10 MB and says the limit", async () => {
    const big = new Uint8Array(10 * 1024 * 1024 + 1);
    big.set([0xff, 0xd8, 0xff, 0xe0]);
    await expectRefused("front", big, "huge.jpg", "image/jpeg", /the most .* is 10 MB/);
  });

  it("stores a large photo reduced to 1600 px, upright, without metadata", async () => {
    // Source: EXIF 2.32 (CIPA DC-008) Orientation 6 — shown turned 90° clockwise: 3000 × 2000
    // stored is 2000 × 3000 upright, so 1067 × 1600 once its long side is 1600.
    const original = await makeJpeg(3000, 2000, 6);
    const response = await uploadCarFile(
      owner,
      carId,
      "rear",
      original,
      "IMG_0001.JPG",
      "image/jpeg",
    );
    expect(response.status).toBe(201);
    const { file } = (await response.json()) as FileAnswer;
    expect([file.widthPx, file.heightPx]).toEqual([1067, 1600]);
    const served = await owner.fetch(file.url);
    expect(served.status).toBe(200);
    expect(served.headers.get("content-type")).toBe("image/jpeg");
    const meta = await sharp(new Uint8Array(await served.arrayBuffer())).metadata();
    expect([meta.width, meta.height]).toEqual([1067, 1600]);
    expect(meta.exif).toBeUndefined();
    expect(await countCarObjects(carId)).toBe(1);
  });

  it("replaces a photo: the old row is marked removed and kept", async () => {
    const first = await uploadCarFile(
      owner,
      carId,
      "front",
      await makeJpeg(800, 600),
      "a.jpg",
      "image/jpeg",
    );
    const second = await uploadCarFile(
      owner,
      carId,
      "front",
      await makeJpeg(640, 480),
      "b.jpg",
      "image/jpeg",
    );
    expect([first.status, second.status]).toEqual([201, 201]);
    const rows = await queryTestDb<{ removed_at: Date | null; width_px: number }>(
      databaseUrl,
      "select removed_at, width_px from car_files where car_id = ? and kind = 'front' order by created_at",
      [carId],
    );
    expect(rows.map((r) => [r.width_px, r.removed_at === null])).toEqual([
      [800, false],
      [640, true],
    ]);
    const listed = (await (await owner.fetch("/api/cars")).json()) as {
      cars: { id: string; files: { kind: string; widthPx: number }[] }[];
    };
    const files = listed.cars.find((c) => c.id === carId)?.files ?? [];
    expect(files.filter((f) => f.kind === "front").map((f) => f.widthPx)).toEqual([640]);
  });

  it("takes a PDF dyno sheet as it is", async () => {
    const pdf = new TextEncoder().encode("%PDF-1.4\n1 0 obj <<>> endobj\ntrailer <<>>\n%%EOF\n");
    const response = await uploadCarFile(
      owner,
      carId,
      "dyno-sheet",
      pdf,
      "dyno.pdf",
      "application/pdf",
    );
    expect(response.status).toBe(201);
    const { file } = (await response.json()) as FileAnswer;
    const served = await owner.fetch(file.url);
    expect(served.headers.get("content-type")).toBe("application/pdf");
    expect(new Uint8Array(await served.arrayBuffer())).toEqual(pdf);
  });

  it("refuses another person: no upload, no view", async () => {
    const rows = await countCarFileRows(databaseUrl, carId);
    const objects = await countCarObjects(carId);
    const upload = await uploadCarFile(
      stranger,
      carId,
      "side",
      await makeJpeg(100, 80),
      "x.jpg",
      "image/jpeg",
    );
    expect(upload.status).toBe(403);
    expect(await countCarFileRows(databaseUrl, carId)).toBe(rows);
    expect(await countCarObjects(carId)).toBe(objects);
    const [one] = await queryTestDb<{ id: string }>(
      databaseUrl,
      "select id from car_files where car_id = ? limit 1",
      [carId],
    );
    const view = await stranger.fetch(`/api/cars/${carId}/files/${one?.id}`);
    expect(view.status).toBe(403);
  });
});

describe("an official of the car's event", () => {
  let entrantCarId: string;
  let entryId: string;
  let eventId: string;
  beforeAll(async () => {
    const [row] = await queryTestDb<{ car_id: string; id: string; event_id: string }>(
      databaseUrl,
      `select e.car_id, e.id, e.event_id from entries e join users u on u.id = e.driver_id
        where u.email = ? and e.status = 'entered' order by e.car_number limit 1`,
      [demo.entrant],
    );
    if (!row) throw new Error("no demo entry");
    [entrantCarId, entryId, eventId] = [row.car_id, row.id, row.event_id];
  });
  afterAll(async () => {
    await queryTestDb(databaseUrl, "delete from car_files where car_id = ?", [entrantCarId]);
  });

  it("sees the entrant's photo on the car card's list and opens it", async () => {
    const up = await uploadCarFile(
      stranger,
      entrantCarId,
      "side",
      await makeJpeg(400, 300),
      "side.jpg",
      "image/jpeg",
    );
    expect(up.status).toBe(201);
    const scrutineer = new HttpSession(appUrl);
    await scrutineer.signInWithPassword(demo.scrutineer, demo.password);
    const list = await scrutineer.fetch(`/api/events/${eventId}/entries/${entryId}/car-files`);
    expect(list.status).toBe(200);
    const { files } = (await list.json()) as { files: { kind: string; url: string }[] };
    expect(files.map((f) => f.kind)).toEqual(["side"]);
    const image = await scrutineer.fetch(files[0]?.url ?? "");
    expect(image.status).toBe(200);
    expect(image.headers.get("content-type")).toBe("image/jpeg");
    // The co-driver account has no role in this event and does not own the car.
    const other = await owner.fetch(files[0]?.url ?? "");
    expect(other.status).toBe(403);
  });
});
