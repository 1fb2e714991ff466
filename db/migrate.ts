import { fileURLToPath } from "node:url";
import { migrate } from "drizzle-orm/mysql2/migrator";
import type { Db } from "./client";

const migrationsFolder = fileURLToPath(new URL("./migrations", import.meta.url));

/** Apply every committed migration not yet applied (drizzle's runtime migrator prints SQL errors). */
export async function migrateDatabase(db: Db): Promise<void> {
  await migrate(db, { migrationsFolder });
}
