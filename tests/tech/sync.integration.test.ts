import { beforeAll, describe, expect, inject, it } from "vitest";
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
  verdicts: { entryId: string; status: string; flags: string[]; needsChief: boolean }[];
};

let fx: Awaited<ReturnType<typeof techFixtures>>;
let scrutineer: HttpSession;
let scrutineerId: string;

async function sync(session: HttpSession, records: unknown[]) {
  const response = await postSync(session, fx.eventId, "test-device", records);
  return {
    status: response.status,
    body: (await readSyncAnswer(session, fx.eventId, response)) as SyncAnswer,
  };
}

beforeAll(async () => {
  fx = await techFixtures(databaseUrl);
  scrutineer = new HttpSession(appUrl);
  await scrutineer.signInWithPassword(demo.scrutineer, demo.password);
  scrutineerId = await fx.userId(demo.scrutineer);
});

describe("POST /api/events/[eventId]/sync", () => {
  it("stores each record once when the same batch arrives three times", async () => {
    const entryId = await fx.entryByNumber(7);
    const batch = [0, 1, 2, 3, 4].map((i) =>
      readingRecord({
        entryId,
        officialId: scrutineerId,
        deviceId: "phone-a",
        dimension: "wingSpanMm",
        valueMm: 1400 + i * 0.2,
        at: new Date(Date.now() + i),
      }),
    );
    const first = await sync(scrutineer, batch);
    expect(first.status).toBe(200);
    expect(first.body.results.map((r) => r.status)).toEqual([
      "stored",
      "stored",
      "stored",
      "stored",
      "stored",
    ]);
    for (let replay = 0; replay < 2; replay += 1) {
      const again = await sync(scrutineer, batch);
      expect(again.body.results.map((r) => r.status)).toEqual([
        "duplicate",
        "duplicate",
        "duplicate",
        "duplicate",
        "duplicate",
      ]);
    }
    expect(
      await countRecords(
        databaseUrl,
        batch.map((r) => r.id),
      ),
    ).toBe(5);
  });

  it("stores the good records of a batch and reports the bad one with a reason", async () => {
    const entryId = await fx.entryByNumber(7);
    const good = [
      readingRecord({
        entryId,
        officialId: scrutineerId,
        deviceId: "phone-a",
        dimension: "bodyWidthMm",
        valueMm: 1720,
      }),
      readingRecord({
        entryId,
        officialId: scrutineerId,
        deviceId: "phone-a",
        dimension: "bodyWidthMm",
        valueMm: 1720.4,
        at: new Date(Date.now() + 5),
      }),
    ];
    const bad = {
      ...readingRecord({
        entryId,
        officialId: scrutineerId,
        deviceId: "phone-a",
        dimension: "bodyWidthMm",
        valueMm: -3,
      }),
    };
    const notMine = readingRecord({
      entryId,
      officialId: await fx.userId(demo.scrutineer2),
      deviceId: "phone-a",
      dimension: "bodyWidthMm",
      valueMm: 1721,
    });
    const { status, body } = await sync(scrutineer, [good[0], bad, good[1], notMine]);
    expect(status).toBe(200);
    expect(body.results.map((r) => r.status)).toEqual(["stored", "refused", "stored", "refused"]);
    expect(body.results[1]?.reason).toMatch(/negative/);
    expect(body.results[3]?.reason).toMatch(/another official/);
    expect(
      await countRecords(
        databaseUrl,
        good.map((r) => r.id),
      ),
    ).toBe(2);
    expect(await countRecords(databaseUrl, [bad.id, notMine.id])).toBe(0);
  });

  it("refuses an override from a scrutineer but takes one from the chief scrutineer", async () => {
    // The highest-numbered car (not yet scrutineered in the demo); car 7 is left for the e-mail test.
    const entryId = (await fx.entryNumbers()).at(-1)?.id ?? "";
    const override = (officialId: string) => ({
      ...readingRecord({ entryId, officialId, deviceId: "phone-a", dimension: "x", valueMm: 0 }),
      kind: "override",
      payload: { status: "held", classId: null, reason: "Wing mount cracked; fix and re-present." },
    });
    const fromScrutineer = override(scrutineerId);
    const refused = await sync(scrutineer, [fromScrutineer]);
    expect(refused.body.results[0]?.status).toBe("refused");
    expect(refused.body.results[0]?.reason).toMatch(/role/);

    const chief = new HttpSession(appUrl);
    await chief.signInWithPassword(demo.chief, demo.password);
    const fromChief = override(await fx.userId(demo.chief));
    const taken = await sync(chief, [fromChief]);
    expect(taken.body.results[0]?.status).toBe("stored");
    const verdict = taken.body.verdicts.find((v) => v.entryId === entryId);
    expect(verdict?.status).toBe("held");
    expect(verdict?.flags).toContain("overridden");
  });

  it("answers 401 to a phone whose sign-in expired, and 403 to an entrant", async () => {
    const entryId = await fx.entryByNumber(7);
    const record = readingRecord({
      entryId,
      officialId: scrutineerId,
      deviceId: "phone-a",
      dimension: "wingChordMm",
      valueMm: 250,
    });
    const anonymous = new HttpSession(appUrl);
    expect((await sync(anonymous, [record])).status).toBe(401);
    const entrant = new HttpSession(appUrl);
    await entrant.signInWithPassword(demo.entrant, demo.password);
    expect((await sync(entrant, [record])).status).toBe(403);
    expect(await countRecords(databaseUrl, [record.id])).toBe(0);
  });

  it("flags for the chief scrutineer two devices' readings of one car that disagree", async () => {
    // Test values, not trade facts: 1400.0 mm and 1412.0 mm with u = 0.5 mm each differ by 12 mm,
    // far beyond their combined expanded uncertainty (k = 2: about 1.4 mm).
    const entryId = await fx.entryByNumber(
      (await fx.entryNumbers()).find((e) => e.carNumber !== 7)?.carNumber ?? 0,
    );
    const other = new HttpSession(appUrl);
    await other.signInWithPassword(demo.scrutineer2, demo.password);
    const a = readingRecord({
      entryId,
      officialId: scrutineerId,
      deviceId: "phone-a",
      dimension: "wingSpanMm",
      valueMm: 1400,
    });
    const b = readingRecord({
      entryId,
      officialId: await fx.userId(demo.scrutineer2),
      deviceId: "phone-b",
      dimension: "wingSpanMm",
      valueMm: 1412,
    });
    await sync(scrutineer, [a]);
    const { body } = await sync(other, [b]);
    const verdict = body.verdicts.find((v) => v.entryId === entryId);
    expect(verdict?.flags).toContain("disagreement");
    expect(verdict?.needsChief).toBe(true);
    const [row] = await queryTestDb<{ needs_chief: number }>(
      databaseUrl,
      "select needs_chief from verdicts where entry_id = ?",
      [entryId],
    );
    expect(row?.needs_chief).toBe(1);
  });
});
