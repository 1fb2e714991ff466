import { createDb, createPool } from "../../db/client";
import { migrateDatabase } from "../../db/migrate";
import { seedDemo } from "../../db/seed/seed-demo";
import { testSeedDay } from "./test-clock";

/**
 * Migrate a fresh test database and load the demo event day into it, seeded relative to the
 * test clock (`testSeedDay`) unless `today` is given, never for a fixed date: a fixed day would
 * leave the real clock behind it (passes are refused once the event is over).
 */
export async function prepareDatabase(
  url: string,
  { today = testSeedDay() }: { today?: string } = {},
): Promise<void> {
  const pool = createPool(url, 4);
  try {
    const db = createDb(pool);
    await migrateDatabase(db);
    await seedDemo(db, { today });
  } finally {
    await pool.end();
  }
}
