// Seed the demo event day into DATABASE_URL when the database has no club yet.
import { sql } from "drizzle-orm";
import { closeDb, getDb } from "../db/client";
import { seedDemo } from "../db/seed/seed-demo";
import { clock } from "../lib/clock";

const db = getDb();
const [rows] = (await db.execute(sql`select count(*) as n from clubs`)) as unknown as [
  { n: number }[],
];
if (Number(rows[0]?.n ?? 0) > 0) {
  console.log("[seed] demo data already present");
} else {
  const today = clock.now().toISOString().slice(0, 10);
  const seeded = await seedDemo(db, { today });
  console.log(`[seed] demo event ${seeded.eventId} with ${seeded.entryIds.length} entries`);
}
await closeDb();
