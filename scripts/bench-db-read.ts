// The database half of `npm run bench:engine`: load the bench's records into a throwaway MariaDB
// database (real schema, real migrations) and time reading them back the way the server does.
import { eq, inArray } from "drizzle-orm";
import { v7 as uuidv7 } from "uuid";
import { createDb, createPool } from "../db/client";
import { migrateDatabase } from "../db/migrate";
import { recordRowToRecord } from "../db/queries/record-row-to-record";
import {
  cars,
  clubs,
  entries,
  events,
  records,
  ruleSets,
  ruleSetVersions,
  users,
  venues,
} from "../db/schema";
import { demoRuleSet } from "../db/seed/demo-rule-set";
import type { TechRecord } from "../lib/scrutineer/records/record-schema";
import { createTestDatabase } from "../tests/support/test-database";

export type DbReadResult = {
  rows: number;
  /** One query for every entry's records (as a board-wide recompute reads them). */
  allAtOnceMs: number;
  /** One query per entry (as a sync batch touching one car reads it). */
  perEntryMs: number;
  /** Every repetition's one-query time, in order (`npm run bench` pairs them with engine runs). */
  allAtOnceRuns: number[];
};

/** Store the bench entries' records in MariaDB and time reading them back (median of `repetitions`). */
export async function measureDbRead(
  benchInputs: { entry: { entryId: string }; records: TechRecord[] }[],
  repetitions = 3,
): Promise<DbReadResult> {
  const database = await createTestDatabase("bench");
  const pool = createPool(database.url, 4);
  try {
    const db = createDb(pool);
    await migrateDatabase(db);
    const now = new Date();
    const ids = {
      club: uuidv7(),
      venue: uuidv7(),
      set: uuidv7(),
      version: uuidv7(),
      event: uuidv7(),
      user: uuidv7(),
    };
    await db
      .insert(users)
      .values({ id: ids.user, name: "Bench official", email: "bench@bench.test", createdAt: now });
    await db
      .insert(clubs)
      .values({ id: ids.club, name: "Bench club", slug: "bench", createdAt: now });
    await db.insert(venues).values({
      id: ids.venue,
      clubId: ids.club,
      name: "Bench venue",
      trackLengthM: 3000,
      timeZone: "UTC",
      createdAt: now,
    });
    await db
      .insert(ruleSets)
      .values({ id: ids.set, clubId: ids.club, name: "bench", createdAt: now });
    await db.insert(ruleSetVersions).values({
      id: ids.version,
      ruleSetId: ids.set,
      version: 1,
      body: demoRuleSet,
      createdAt: now,
    });
    await db.insert(events).values({
      id: ids.event,
      clubId: ids.club,
      venueId: ids.venue,
      name: "Bench",
      slug: "bench",
      eventDate: "2026-05-16",
      timeZone: "UTC",
      unitSystem: "mm",
      ruleSetVersionId: ids.version,
      entryFeeMinor: 0,
      currency: "GBP",
      capacity: 2000,
      createdAt: now,
      updatedAt: now,
    });
    const entryIds = new Map<string, string>();
    const entryRows = benchInputs.map((input, i) => {
      const id = uuidv7();
      entryIds.set(input.entry.entryId, id);
      return {
        id,
        eventId: ids.event,
        carId: "",
        carNumber: i + 1,
        declaredClass: "kestrel",
        driverId: ids.user,
        declarations: {},
        createdAt: now,
        updatedAt: now,
      };
    });
    const carRows = entryRows.map(() => ({
      id: uuidv7(),
      ownerId: ids.user,
      make: "Bench",
      model: "Car",
      year: 2000,
      colour: "Grey",
      createdAt: now,
      updatedAt: now,
    }));
    entryRows.forEach((e, i) => {
      e.carId = carRows[i]?.id ?? "";
    });
    for (let i = 0; i < carRows.length; i += 500)
      await db.insert(cars).values(carRows.slice(i, i + 500));
    for (let i = 0; i < entryRows.length; i += 500)
      await db.insert(entries).values(entryRows.slice(i, i + 500));
    const recordRows = benchInputs.flatMap((input) =>
      input.records.map((r) => ({
        id: r.id,
        eventId: ids.event,
        entryId: entryIds.get(r.entryId) ?? "",
        kind: r.kind,
        payload: r.payload,
        officialId: ids.user,
        deviceId: r.deviceId,
        deviceTime: new Date(r.deviceTime),
        receivedAt: now,
      })),
    );
    for (let i = 0; i < recordRows.length; i += 1000)
      await db.insert(records).values(recordRows.slice(i, i + 1000));

    const all = [...entryIds.values()];
    const median = (xs: number[]) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)] ?? 0;
    const allRuns: number[] = [];
    const perRuns: number[] = [];
    let rows = 0;
    for (let rep = 0; rep < repetitions; rep += 1) {
      let started = performance.now();
      const got = (await db.select().from(records).where(eq(records.eventId, ids.event))).map(
        recordRowToRecord,
      );
      allRuns.push(performance.now() - started);
      rows = got.length;
      started = performance.now();
      for (const entryId of all) {
        (
          await db
            .select()
            .from(records)
            .where(inArray(records.entryId, [entryId]))
        ).map(recordRowToRecord);
      }
      perRuns.push(performance.now() - started);
    }
    return {
      rows,
      allAtOnceMs: median(allRuns),
      perEntryMs: median(perRuns),
      allAtOnceRuns: allRuns,
    };
  } finally {
    await pool.end();
    await database.drop();
  }
}
