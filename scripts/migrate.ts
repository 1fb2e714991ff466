// Apply committed migrations to DATABASE_URL.
import { closeDb, getDb } from "../db/client";
import { migrateDatabase } from "../db/migrate";

const started = performance.now();
await migrateDatabase(getDb());
await closeDb();
console.log(`[migrate] up to date in ${Math.round(performance.now() - started)} ms`);
