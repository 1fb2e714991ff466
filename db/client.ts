import { drizzle } from "drizzle-orm/mysql2";
import mysql from "mysql2/promise";
import { env } from "../lib/env";
import * as schema from "./schema";

/** Open a mysql2 pool on a URL. Times are stored and read as UTC. */
export function createPool(url: string, connectionLimit = 10): mysql.Pool {
  const pool = mysql.createPool({
    uri: url,
    connectionLimit,
    timezone: "Z",
    dateStrings: false,
    supportBigNumbers: true,
  });
  // A lock wait gives up after 5 s, not InnoDB's 50 (then runTransaction tries again): a
  // transaction stamps its receive or compute time when it starts, and phones' partial packs
  // look back 10 s for rows committed late.
  pool.on("connection", (connection) => {
    connection.query("SET SESSION innodb_lock_wait_timeout = 5");
  });
  return pool;
}

export function createDb(pool: mysql.Pool) {
  return drizzle(pool, { schema, mode: "default" });
}

export type Db = ReturnType<typeof createDb>;

// One pool per process; cached on globalThis so dev-server reloads do not leak connections.
const globalForDb = globalThis as unknown as { plumblinePool?: mysql.Pool; plumblineDb?: Db };

export function getPool(): mysql.Pool {
  globalForDb.plumblinePool ??= createPool(env.DATABASE_URL);
  return globalForDb.plumblinePool;
}

export function getDb(): Db {
  globalForDb.plumblineDb ??= createDb(getPool());
  return globalForDb.plumblineDb;
}

/** Close the process's pool (scripts and tests). */
export async function closeDb(): Promise<void> {
  const pool = globalForDb.plumblinePool;
  globalForDb.plumblinePool = undefined;
  globalForDb.plumblineDb = undefined;
  await pool?.end();
}
