import { createDb, createPool } from "../../db/client";
import { migrateDatabase } from "../../db/migrate";
import { seedDemo } from "../../db/seed/seed-demo";

/** Migrate a fresh test database and load the demo event day into it. */
export async function prepareDatabase(url: string): Promise<void> {
  const pool = createPool(url, 4);
  try {
    const db = createDb(pool);
    await migrateDatabase(db);
    await seedDemo(db, { today: "2027-04-12" });
  } finally {
    await pool.end();
  }
}
