import "server-only";
import { sql } from "drizzle-orm";
import { getDb } from "../client";

/** Ask the database for `SELECT 1` and the number of applied migrations. */
export async function pingDatabase(): Promise<{ migrations: number }> {
  const db = getDb();
  await db.execute(sql`select 1`);
  const [rows] = (await db.execute(
    sql`select count(*) as n from __drizzle_migrations`,
  )) as unknown as [{ n: number }[]];
  return { migrations: Number(rows[0]?.n ?? 0) };
}
