// npm run bench:groups — build run groups for a field of 300 drives read from MariaDB, and print
// the build time, its ratio to the read of those entries (the query the clerk's page lists them
// with), and the objective against the lower bounds. A benchmark, not a test: nothing is asserted.
// Works in its own throwaway database (plumbline_test_bench_groups_*), dropped at the end; never
// starts or stops MariaDB. Bounded loops only.
import { buildRunGroups } from "../lib/paddock/build-run-groups";
import { type Drive, experienceLevels } from "../lib/paddock/drive";
import { groupCap } from "../lib/paddock/group-cap";
import { planScoreWeights } from "../lib/paddock/score-run-groups";
import { createTestDatabase } from "../tests/support/test-database";

const targetDrives = 300;
const entriesToSeed = 280;
const sharedCars = 45;
const repetitions = 7;

const median = (xs: number[]) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)] ?? 0;

/** A lower bound on the objective from relaxations: every class and every experience level must
 *  sit somewhere (Σ (distinct − 1) ≥ present − groups), sizes cannot all be equal unless the
 *  groups divide the field, and the lap spread of sorted estimates cut at the groups − 1 widest
 *  gaps (no cap, no conflicts, no other term). */
function relaxedBound(drives: Drive[], groups: number): number {
  const w = planScoreWeights;
  const classes = new Set(drives.map((d) => d.classId)).size;
  const levels = new Set(drives.map((d) => d.experience)).size;
  const laps = drives.flatMap((d) => (d.lapTimeMs ? [d.lapTimeMs] : [])).sort((a, b) => a - b);
  const gaps = laps
    .slice(1)
    .map((l, i) => l - (laps[i] ?? l))
    .sort((a, b) => b - a);
  const range = laps.length > 1 ? (laps.at(-1) ?? 0) - (laps[0] ?? 0) : 0;
  const lap = range - gaps.slice(0, groups - 1).reduce((a, b) => a + b, 0);
  return (
    w.classMix * Math.max(0, classes - groups) +
    w.experienceSpread * Math.max(0, levels - groups) +
    w.sizeSpread * (drives.length % groups === 0 ? 0 : 1) +
    w.lapSpreadMs * lap
  );
}

async function main() {
  const database = await createTestDatabase("bench_groups");
  // The app's modules read DATABASE_URL once, when first imported: set it first, import after.
  process.env.DATABASE_URL = database.url;
  // A throwaway database seeded with the demo day, as the other benches and the tests do.
  process.env.PLUMBLINE_MODE = "demo";
  const { createDb, createPool, getPool } = await import("../db/client");
  const { migrateDatabase } = await import("../db/migrate");
  const { seedDemo } = await import("../db/seed/seed-demo");
  const { testSeedDay } = await import("../tests/support/test-clock");
  const { seedLargeEvent } = await import("./bench/seed-large-event");
  const { listEventEntries } = await import("../db/queries/list-event-entries");
  const { demoRuleSet } = await import("../db/seed/demo-rule-set");
  const schema = await import("../db/schema");
  const { eq, inArray } = await import("drizzle-orm");
  const pool = createPool(database.url, 2);
  try {
    const db = createDb(pool);
    await migrateDatabase(db);
    const seed = await seedDemo(db, { today: testSeedDay() });
    const officials: [string, string] = [
      seed.userIds.scrutineer ?? "",
      seed.userIds.scrutineer2 ?? "",
    ];
    const large = await seedLargeEvent(db, {
      demoEventId: seed.eventId,
      officials,
      entries: entriesToSeed,
      recordsPerEntry: 1,
    });
    // Lap-time estimates for nine in ten entries; co-drivers for `sharedCars` entries, a fifth of
    // them another entry's driver (one person in two cars).
    const rows = await db
      .select({
        id: schema.entries.id,
        driverId: schema.entries.driverId,
        carNumber: schema.entries.carNumber,
      })
      .from(schema.entries)
      .where(eq(schema.entries.eventId, large.eventId))
      .orderBy(schema.entries.carNumber);
    const { v7: uuidv7 } = await import("uuid");
    const now = new Date();
    for (const [k, row] of rows.entries()) {
      const estimate = k % 10 === 9 ? null : 95_000 + ((row.carNumber * 7919) % 30_000);
      let coDriverId: string | null = null;
      if (
        k % Math.floor(rows.length / sharedCars) === 0 &&
        k / Math.floor(rows.length / sharedCars) < sharedCars
      ) {
        if (k % 5 === 0) coDriverId = rows[(k + 97) % rows.length]?.driverId ?? null;
        else {
          coDriverId = uuidv7();
          await db.insert(schema.users).values({
            id: coDriverId,
            name: `Bench co-driver ${k}`,
            email: `bench-groups-codriver-${k}@bench.test`,
            createdAt: now,
          });
        }
      }
      await db
        .update(schema.entries)
        .set({ lapTimeEstimateMs: estimate, coDriverId })
        .where(eq(schema.entries.id, row.id));
    }
    const [venue] = await db
      .select({
        trackLengthM: schema.venues.trackLengthM,
        maxCarsOnTrack: schema.venues.maxCarsOnTrack,
        carsPerKm: schema.venues.carsPerKm,
      })
      .from(schema.events)
      .innerJoin(schema.venues, eq(schema.venues.id, schema.events.venueId))
      .where(eq(schema.events.id, large.eventId));
    const cap = groupCap({
      maxCarsOnTrack: venue?.maxCarsOnTrack ?? null,
      trackLengthM: venue?.trackLengthM ?? null,
      carsPerKm: venue?.carsPerKm ?? null,
    });

    // The read: the query the clerk's page lists an event's entries with, warm, then timed.
    await listEventEntries({ eventId: large.eventId });
    const readMs: number[] = [];
    let listed: Awaited<ReturnType<typeof listEventEntries>> = [];
    for (let r = 0; r < repetitions; r += 1) {
      const t0 = performance.now();
      listed = await listEventEntries({ eventId: large.eventId });
      readMs.push(performance.now() - t0);
    }
    // Person ids (the list carries names only), read once, untimed.
    const people = new Map(
      (
        await db
          .select({
            id: schema.entries.id,
            driverId: schema.entries.driverId,
            coDriverId: schema.entries.coDriverId,
          })
          .from(schema.entries)
          .where(
            inArray(
              schema.entries.id,
              listed.map((e) => e.entryId),
            ),
          )
      ).map((p) => [p.id, p]),
    );
    const rank = new Map(demoRuleSet.classes.map((c, i) => [c.id, i]));
    const drives: Drive[] = [];
    for (const e of listed) {
      if (e.status !== "cleared" && e.status !== "moved-up") continue;
      const ids = people.get(e.entryId);
      const classId = e.finalClass ?? e.declaredClass;
      const slots = [
        { slot: 1, person: ids?.driverId ?? "", name: e.driverName ?? "" },
        ...(ids?.coDriverId
          ? [{ slot: 2, person: ids.coDriverId, name: e.coDriverName ?? "" }]
          : []),
      ];
      if (drives.length + slots.length > targetDrives) break;
      for (const s of slots)
        drives.push({
          driveId: `${e.entryId}:${s.slot}`,
          entryId: e.entryId,
          carNumber: e.carNumber,
          carKey: e.entryId,
          driverKey: s.person,
          driverName: s.name,
          classId,
          className: e.finalClassName ?? classId,
          classRank: rank.get(classId) ?? 0,
          // Experience is not stored yet: spread over the four levels from the car number.
          experience: experienceLevels[(e.carNumber * 3 + s.slot) % 4] ?? "novice",
          lapTimeMs: e.lapTimeEstimateMs,
        });
    }

    buildRunGroups({ drives, capCars: cap.cars });
    const buildMs: number[] = [];
    let plan = buildRunGroups({ drives, capCars: cap.cars });
    for (let r = 0; r < repetitions; r += 1) {
      const t0 = performance.now();
      plan = buildRunGroups({ drives, capCars: cap.cars });
      buildMs.push(performance.now() - t0);
    }
    const shared = new Set(drives.filter((d) => d.driveId.endsWith(":2")).map((d) => d.entryId))
      .size;
    const bound = relaxedBound(drives, plan.groups.length);
    const read = median(readMs);
    const build = median(buildMs);
    const s = plan.score;
    const lines = [
      `bench:groups — ${drives.length} drives (${listed.length} entries listed, ${shared} shared cars), cap ${cap.source}`,
      `read (listEventEntries, ${listed.length} rows): median ${read.toFixed(1)} ms of ${repetitions}`,
      `build (buildRunGroups):                median ${build.toFixed(1)} ms of ${repetitions} (min ${Math.min(...buildMs).toFixed(1)}, max ${Math.max(...buildMs).toFixed(1)})`,
      `build ÷ read: ${(build / read).toFixed(1)}`,
      `groups: ${plan.groups.length}, lower bound ${plan.lowerBound} (${plan.groups.length === plan.lowerBound ? "at the bound" : `+${plan.groups.length - plan.lowerBound}`})`,
      `objective: ${s.total} = back-to-back ${s.backToBack}, round wrap ${s.roundWrap}, novices with the fastest ${s.noviceWithFastest}, class mix ${s.classMix}, class-rank spread ${s.classRankSpread}, experience spread ${s.experienceSpread}, size spread ${s.sizeSpread}, lap spread ${(s.lapSpreadMs / 1000).toFixed(1)} s`,
      `relaxed lower bound on the objective: ${bound} (objective ÷ bound ${(s.total / Math.max(1, bound)).toFixed(2)}; the bound ignores the cap, conflicts, class-rank spread and how classes and laps correlate, so it is loose)`,
      `gave way: ${plan.gaveWay.length}`,
    ];
    for (const line of lines) console.log(line);
  } finally {
    await pool.end();
    await getPool().end();
    await database.drop();
  }
}

main().catch((error) => {
  console.error(error);
  process.exitCode = 1;
});
