// Attacks on the sync route by a careless or hostile phone: a device clock set to 9999 that would
// win "latest wins" forever; a 65-character device id that made the whole batch a 500; text with
// no maximum (instrument names, item ids, reasons, keys) and a 40,000-space override reason that
// took seconds to trim; and an endless chain of voids on one car. Each bad record is refused on
// its own, with words; the rest of the batch is stored; nothing answers 500.
import { v7 as uuidv7 } from "uuid";
import { afterAll, beforeAll, describe, expect, inject, it } from "vitest";
import { MAX_VOIDS_PER_ENTRY } from "@/lib/scrutineer/records/max-voids-per-entry";
import { demo } from "../support/demo-accounts";
import { HttpSession } from "../support/http-session";
import { postSync } from "../support/post-sync";
import { queryTestDb } from "../support/query-test-db";
import { makeScratchEntries, removeScratchEntries } from "../support/scratch-entries";
import { countRecords, readingRecord, techFixtures } from "../support/tech-fixtures";

const appUrl = inject("appUrl");
const databaseUrl = inject("databaseUrl");

type SyncAnswer = { results: { id: string | null; status: string; reason?: string }[] };

let fx: Awaited<ReturnType<typeof techFixtures>>;
let sam: HttpSession;
let chief: HttpSession;
let samId: string;
let chiefId: string;
let entryId = "";
afterAll(() => removeScratchEntries(databaseUrl, [entryId]));

async function sync(session: HttpSession, records: unknown[]) {
  const response = await postSync(session, fx.eventId, "phone-test", records);
  return { status: response.status, body: (await response.json()) as SyncAnswer };
}

const checklist = (officialId: string, at: string, result: "pass" | "fail") => ({
  id: uuidv7(),
  kind: "checklist",
  entryId,
  officialId,
  deviceId: "phone-test",
  deviceTime: at,
  payload: { itemId: "kill-switch", result },
});

beforeAll(async () => {
  fx = await techFixtures(databaseUrl);
  sam = new HttpSession(appUrl);
  await sam.signInWithPassword(demo.scrutineer, demo.password);
  chief = new HttpSession(appUrl);
  await chief.signInWithPassword(demo.chief, demo.password);
  samId = await fx.userId(demo.scrutineer);
  chiefId = await fx.userId(demo.chief);
  // A car of this file's own, so what it writes changes no car another file reads.
  entryId = (await makeScratchEntries(databaseUrl, fx.eventId, 1))[0] ?? "";
});

describe("the phone's clock cannot win forever", () => {
  it("refuses a record dated 9999-12-31 and says to set the phone's clock", async () => {
    const future = checklist(samId, "9999-12-31T23:59:59.000Z", "pass");
    const { status, body } = await sync(sam, [future]);
    expect(status).toBe(200);
    expect(body.results[0]).toMatchObject({ status: "refused" });
    expect(body.results[0]?.reason).toMatch(/phone's clock is wrong.*Set the phone's date, time/);
    expect(await countRecords(databaseUrl, [future.id])).toBe(0);
  });

  it("takes a record a minute ahead (a phone clock a little fast) and one from the past", async () => {
    const ahead = checklist(samId, new Date(Date.now() + 60_000).toISOString(), "pass");
    const past = checklist(samId, new Date(Date.now() - 3_600_000).toISOString(), "pass");
    const { body } = await sync(sam, [ahead, past]);
    expect(body.results.map((r) => r.status)).toEqual(["stored", "stored"]);
  });
});

describe("every text field is bounded, and only the bad record is refused", () => {
  it("refuses a 65-character device id on one record and stores the rest (was a 500)", async () => {
    const good = readingRecord({
      entryId,
      officialId: samId,
      deviceId: "phone-test",
      dimension: "wingChordMm",
      valueMm: 250,
    });
    const bad = { ...good, id: uuidv7(), deviceId: "d".repeat(65) };
    const { status, body } = await sync(sam, [bad, good]);
    expect(status).toBe(200);
    expect(body.results[0]).toMatchObject({ status: "refused" });
    expect(body.results[0]?.reason).toBe(
      "The phone's name is too long: at most 64 characters; this one has 65. Record it again, shorter.",
    );
    expect(body.results[1]).toMatchObject({ status: "stored" });
  });

  it.each([
    [
      "an instrument name",
      (r: ReturnType<typeof readingRecord>) => {
        r.payload.instrument.name = "n".repeat(121);
      },
    ],
    [
      "an instrument id",
      (r: ReturnType<typeof readingRecord>) => {
        r.payload.instrument.id = "i".repeat(65);
      },
    ],
    [
      "an official id",
      (r: ReturnType<typeof readingRecord>) => {
        r.officialId = "o".repeat(256);
      },
    ],
  ])("refuses %s past its limit", async (_what, spoil) => {
    const record = readingRecord({
      entryId,
      officialId: samId,
      deviceId: "phone-test",
      dimension: "wingChordMm",
      valueMm: 251,
    });
    spoil(record);
    const { status, body } = await sync(sam, [record]);
    expect(status).toBe(200);
    expect(body.results[0]).toMatchObject({ status: "refused" });
    expect(body.results[0]?.reason).toMatch(/too long: at most \d+ characters/);
  });

  it("refuses a checklist item id of 10,000 characters", async () => {
    const record = { ...checklist(samId, new Date().toISOString(), "pass") };
    record.payload = { ...record.payload, itemId: "x".repeat(10_000) };
    const { body } = await sync(sam, [record]);
    expect(body.results[0]?.reason).toMatch(/checklist item is too long: at most 64/);
  });

  it("refuses an override reason of 40,000 spaces by its length, before any trimming", async () => {
    const record = {
      id: uuidv7(),
      kind: "override",
      entryId,
      officialId: chiefId,
      deviceId: "phone-chief",
      deviceTime: new Date().toISOString(),
      payload: { status: "held", classId: null, reason: `a${" ".repeat(40_000)}b` },
    };
    const { status, body } = await sync(chief, [record]);
    expect(status).toBe(200);
    expect(body.results[0]?.reason).toMatch(/reason is too long: at most 2000 characters/);
  });

  it("refuses a void reason past 1,000 characters", async () => {
    const record = {
      id: uuidv7(),
      kind: "void",
      entryId,
      officialId: chiefId,
      deviceId: "phone-chief",
      deviceTime: new Date().toISOString(),
      payload: { targetRecordId: uuidv7(), reason: "r".repeat(1001) },
    };
    const { body } = await sync(chief, [record]);
    expect(body.results[0]?.reason).toMatch(/reason is too long: at most 1000 characters/);
  });
});

describe("a chain of voids is bounded per car", () => {
  it(`stores at most ${MAX_VOIDS_PER_ENTRY} voids for one car and refuses the next in words`, async () => {
    const [{ n: before } = { n: 0 }] = await queryTestDb<{ n: number }>(
      databaseUrl,
      "select count(*) as n from records where entry_id = ? and kind = 'void'",
      [entryId],
    );
    const start = Date.now() - 600_000;
    const chain: { id: string }[] = [];
    let target = uuidv7();
    const total = MAX_VOIDS_PER_ENTRY - Number(before) + 1;
    for (let i = 0; i < total; i += 1) {
      const record = {
        id: uuidv7({ msecs: start + i }),
        kind: "void",
        entryId,
        officialId: chiefId,
        deviceId: "phone-chief",
        deviceTime: new Date(start + i).toISOString(),
        payload: { targetRecordId: target, reason: "chained on purpose" },
      };
      chain.push(record);
      target = record.id;
    }
    const answers: SyncAnswer["results"] = [];
    for (let i = 0; i < chain.length; i += 100) {
      const { status, body } = await sync(chief, chain.slice(i, i + 100));
      expect(status).toBe(200);
      answers.push(...body.results);
    }
    expect(answers.slice(0, -1).every((r) => r.status === "stored")).toBe(true);
    expect(answers.at(-1)).toMatchObject({ status: "refused" });
    expect(answers.at(-1)?.reason).toMatch(/already has 200 voids/);
  });
});
