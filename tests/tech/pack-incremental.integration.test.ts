import "fake-indexeddb/auto";
import { afterAll, beforeAll, describe, expect, inject, it } from "vitest";
import { type EventPack, eventPackSchema } from "@/lib/offline/event-pack-schema";
import { saveEventPack } from "@/lib/offline/save-event-pack";
import { measurePackSize } from "../../scripts/bench/pack-size";
import { demo } from "../support/demo-accounts";
import { HttpSession } from "../support/http-session";
import { postSync } from "../support/post-sync";
import { queryTestDb } from "../support/query-test-db";
import { makeScratchEntries, removeScratchEntries } from "../support/scratch-entries";
import { readingRecord, techFixtures } from "../support/tech-fixtures";

// The incremental event pack against the built app and MariaDB: a refresh with the phone's
// cursor carries only the records received and the verdicts computed since (format 2), the
// phone's merge of it equals a whole pack, and the ETag moves with every change of content.
const appUrl = inject("appUrl");
const databaseUrl = inject("databaseUrl");

let fx: Awaited<ReturnType<typeof techFixtures>>;
let scrutineer: HttpSession;
let heldCar: string;
let steadyCar: string;

beforeAll(async () => {
  fx = await techFixtures(databaseUrl);
  scrutineer = new HttpSession(appUrl);
  await scrutineer.signInWithPassword(demo.scrutineer, demo.password);
  [heldCar, steadyCar] = (await makeScratchEntries(databaseUrl, fx.eventId, 2)) as [string, string];
});

afterAll(async () => {
  await removeScratchEntries(databaseUrl, [heldCar, steadyCar]);
});

async function getPack(query: string, etag?: string) {
  const response = await scrutineer.fetch(`/api/events/${fx.eventId}/pack${query}`, {
    headers: etag ? { "if-none-match": etag } : {},
  });
  return {
    status: response.status,
    pack: response.status === 200 ? eventPackSchema.parse(await response.json()) : null,
  };
}

async function wholePack(): Promise<EventPack> {
  const { pack } = await getPack("?format=2");
  if (!pack) throw new Error("no pack");
  return pack;
}

/** Send one record as a phone does and wait (15 s at most) until the server has recomputed its
 *  car's verdict after the batch's receive time — in the request or in a worker. */
async function syncAndAwaitVerdict(record: { id: string; entryId: string }) {
  const response = await postSync(scrutineer, fx.eventId, "phone-inc", [record]);
  expect(response.status).toBe(200);
  const answer = (await response.json()) as {
    results: { id: string; status: string }[];
    receivedAt: string;
  };
  expect(answer.results).toEqual([{ id: record.id, status: "stored" }]);
  const receivedAt = Date.parse(answer.receivedAt);
  const deadline = Date.now() + 15_000;
  for (;;) {
    const [row] = await queryTestDb<{ computed_at: Date }>(
      databaseUrl,
      "select computed_at from verdicts where entry_id = ?",
      [record.entryId],
    );
    if (row && row.computed_at.getTime() >= receivedAt) return answer.receivedAt;
    if (Date.now() > deadline) throw new Error(`no verdict for ${record.entryId} after the sync`);
    await new Promise((resolve) => setTimeout(resolve, 100));
  }
}

/** Make the car's stored verdict an hour older. */
async function hourOld(entryId: string) {
  await queryTestDb(
    databaseUrl,
    "update verdicts set computed_at = computed_at - interval 1 hour where entry_id = ?",
    [entryId],
  );
}

const sqlTime = (iso: string) => iso.replace("T", " ").replace("Z", "");
const ofCar = (entryId: string) => (item: { entryId: string }) => item.entryId === entryId;

describe("GET /api/events/[eventId]/pack?since=…&format=2", () => {
  let full: EventPack;
  let partial: EventPack;
  let batteryRecordId: string;

  it("sends only the records received and the verdicts computed since the cursor", async () => {
    const officialId = await fx.userId(demo.scrutineer);
    // Car "steady" was measured an hour ago: its record and verdict are older than any cursor.
    await syncAndAwaitVerdict(
      readingRecord({
        entryId: steadyCar,
        officialId,
        deviceId: "phone-inc",
        dimension: "bodyWidthMm",
        valueMm: 1800,
      }),
    );
    await queryTestDb(
      databaseUrl,
      "update records set received_at = received_at - interval 1 hour where entry_id = ?",
      [steadyCar],
    );
    await hourOld(steadyCar);
    full = await wholePack();
    expect(full.partial).toBe(false);
    expect(full.verdicts.find(ofCar(steadyCar))).toBeDefined();
    expect(full.records.find(ofCar(steadyCar))).toBeDefined();

    // Then car "held" fails a safety item.
    const battery = {
      ...readingRecord({
        entryId: heldCar,
        officialId,
        deviceId: "phone-inc",
        dimension: "x",
        valueMm: 0,
      }),
      kind: "checklist",
      payload: { itemId: "battery", result: "fail", comment: "Battery loose in its tray." },
    };
    batteryRecordId = battery.id;
    const receivedAt = await syncAndAwaitVerdict(battery);

    const answer = await getPack(
      `?since=${encodeURIComponent(full.recordsCursor ?? "")}&format=2`,
      full.etag,
    );
    expect(answer.status).toBe(200);
    partial = answer.pack as EventPack;
    expect(partial).toMatchObject({ partial: true, packFormat: 2 });
    expect(partial.etag).not.toBe(full.etag);
    const cursor = Date.parse(full.recordsCursor ?? "");
    // The new record and the changed verdict are there …
    expect(partial.records.map((r) => r.id)).toContain(battery.id);
    const held = partial.verdicts.find(ofCar(heldCar));
    // A failed safety item stops the car until it is fixed: common practice (no source).
    expect(held?.status).toBe("held");
    expect(Date.parse(held?.computedAt ?? "")).toBeGreaterThanOrEqual(Date.parse(receivedAt));
    // … and nothing from before the cursor: not the whole event again.
    expect(partial.records.find(ofCar(steadyCar))).toBeUndefined();
    expect(partial.verdicts.find(ofCar(steadyCar))).toBeUndefined();
    for (const r of partial.records) expect(Date.parse(r.receivedAt)).toBeGreaterThan(cursor);
    for (const v of partial.verdicts) expect(Date.parse(v.computedAt)).toBeGreaterThan(cursor);
    // The small parts stay whole.
    expect(partial.entries.length).toBe(full.entries.length);
  });

  it("merged on the phone, gives these cars what a whole pack gives", async () => {
    await saveEventPack(full, new Date());
    const merged = await saveEventPack(partial, new Date());
    const whole = await wholePack();
    for (const car of [heldCar, steadyCar]) {
      expect(merged.verdicts.filter(ofCar(car))).toEqual(whole.verdicts.filter(ofCar(car)));
      expect(
        merged.records
          .filter(ofCar(car))
          .map((r) => r.id)
          .sort(),
      ).toEqual(
        whole.records
          .filter(ofCar(car))
          .map((r) => r.id)
          .sort(),
      );
    }
    expect(merged.records.map((r) => r.id)).toContain(batteryRecordId);
  });

  it("still carries a verdict computed just before the last pack but stored after it", async () => {
    // What a slow recompute looks like: computed a second before the pack was made, committed
    // once the pack had been read. The cursor's step-back must cover it, for verdicts as for
    // records, and the ETag must move although no verdict is newer than the newest before.
    const lateComputedAt = new Date(Date.parse(partial.generatedAt) - 1000).toISOString();
    await queryTestDb(
      databaseUrl,
      "update verdicts set computed_at = ?, reason = 'Recomputed late.' where entry_id = ?",
      [sqlTime(lateComputedAt), steadyCar],
    );
    const answer = await getPack(
      `?since=${encodeURIComponent(partial.recordsCursor ?? "")}&format=2`,
      partial.etag,
    );
    expect(answer.status).toBe(200);
    const late = answer.pack?.verdicts.find(ofCar(steadyCar));
    expect(late).toMatchObject({ reason: "Recomputed late.", computedAt: lateComputedAt });
  });

  it("moves the ETag when a verdict is rewritten with a time below the newest one", async () => {
    // Two recomputes finishing out of order: this car's new time is later than its own old one
    // but earlier than another car's, so the count and the newest time stay the same.
    await hourOld(steadyCar);
    const before = await wholePack();
    const steady = before.verdicts.find(ofCar(steadyCar));
    const newest = before.verdicts
      .map((v) => v.computedAt)
      .sort()
      .at(-1);
    expect(steady?.computedAt).not.toBe(newest);
    await queryTestDb(
      databaseUrl,
      "update verdicts set computed_at = computed_at + interval 1 second where entry_id = ?",
      [steadyCar],
    );
    const answer = await getPack("?format=2", before.etag);
    expect(answer.status).toBe(200);
    expect(answer.pack?.etag).not.toBe(before.etag);
  });

  it("keeps every verdict in a partial pack for a phone that does not ask for format 2", async () => {
    const answer = await getPack(`?since=${encodeURIComponent(full.recordsCursor ?? "")}`);
    expect(answer.pack).toMatchObject({ partial: true, packFormat: 1 });
    expect(answer.pack?.verdicts.find(ofCar(steadyCar))).toBeDefined();
    expect(answer.pack?.records.find(ofCar(steadyCar))).toBeUndefined();
  });

  it("leaves out the entries and rule set the phone has, and sends the entries again once one changes", async () => {
    const since = encodeURIComponent(full.recordsCursor ?? "");
    const has = `&entries=${full.entriesTag}&rules=${full.ruleSetVersionId}`;
    const unchanged = await getPack(`?format=2&since=${since}${has}`);
    expect(unchanged.pack).toMatchObject({ keptEntries: true, keptRuleSet: true, entries: [] });
    expect(unchanged.pack?.ruleSet).toBeNull();
    // A phone holding other entries (an older list) gets the whole list.
    const stale = await getPack(`?format=2&since=${since}&entries=older&rules=older`);
    expect(stale.pack?.keptEntries).toBe(false);
    expect(stale.pack?.entries.length).toBe(full.entries.length);
    expect(stale.pack?.ruleSet).not.toBeNull();
    // An entry changes (its car's colour): the digest moves and the list comes whole again.
    const [car] = await queryTestDb<{ id: string; colour: string | null }>(
      databaseUrl,
      "select c.id, c.colour from cars c join entries e on e.car_id = c.id where e.id = ?",
      [steadyCar],
    );
    await queryTestDb(databaseUrl, "update cars set colour = ? where id = ?", [
      `${car?.colour ?? ""} (repainted)`,
      car?.id,
    ]);
    try {
      const changed = await getPack(`?format=2&since=${since}${has}`);
      expect(changed.pack?.keptEntries).toBe(false);
      expect(changed.pack?.entriesTag).not.toBe(full.entriesTag);
      expect(changed.pack?.entries.length).toBe(full.entries.length);
    } finally {
      await queryTestDb(databaseUrl, "update cars set colour = ? where id = ?", [
        car?.colour ?? null,
        car?.id,
      ]);
    }
  });

  it("is measured by the bench: a refresh after one sync is a small part of the whole pack", async () => {
    const officialId = await fx.userId(demo.scrutineer);
    const sizes = await measurePackSize({
      baseUrl: appUrl,
      eventId: fx.eventId,
      fetchAs: (url, init) => scrutineer.fetch(url, init),
      between: async () => {
        await syncAndAwaitVerdict(
          readingRecord({
            entryId: heldCar,
            officialId,
            deviceId: "phone-inc",
            dimension: "bodyWidthMm",
            valueMm: 1795,
          }),
        );
      },
    });
    // The phone said which entries and rule set it holds: unchanged, they are left out.
    expect(sizes.full.entries).toBeGreaterThan(0);
    expect(sizes.partial.entries).toBe(0);
    expect(sizes.partial.partBytes.ruleSet).toBeLessThanOrEqual(4); // null
    expect(sizes.partial.status).toBe(200);
    expect(sizes.partial.records).toBeGreaterThanOrEqual(1);
    expect(sizes.partial.records).toBeLessThan(sizes.full.records);
    expect(sizes.partial.rawBytes).toBeLessThan(sizes.full.rawBytes);
    expect(sizes.full.gzipBytes).toBeLessThan(sizes.full.rawBytes);
    console.info("[pack size]", JSON.stringify(sizes));
  });
});
