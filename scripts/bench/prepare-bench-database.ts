// The bench's own database on the running MariaDB: a throwaway `plumbline_test_bench_*`,
// migrated and seeded with the demo day (as the integration tests seed theirs).
import { createDb, createPool } from "../../db/client";
import { migrateDatabase } from "../../db/migrate";
import { type DemoSeed, seedDemo } from "../../db/seed/seed-demo";
import { testSeedDay } from "../../tests/support/test-clock";
import { createTestDatabase } from "../../tests/support/test-database";

export type BenchDatabase = {
  name: string;
  url: string;
  seed: DemoSeed;
  drop: () => Promise<void>;
};

/** Create, migrate and seed the bench database; drops it again if seeding fails. */
export async function prepareBenchDatabase(): Promise<BenchDatabase> {
  const database = await createTestDatabase("bench");
  try {
    const pool = createPool(database.url, 2);
    try {
      const db = createDb(pool);
      await migrateDatabase(db);
      const seed = await seedDemo(db, { today: testSeedDay() });
      return { ...database, seed };
    } finally {
      await pool.end();
    }
  } catch (error) {
    await database.drop();
    throw error;
  }
}
