import mysql from "mysql2/promise";
import { testDatabaseUrl } from "./test-env";

/** Create a fresh, empty database for this run (the app user may create plumbline_test_*). */
export async function createTestDatabase(
  prefix: string,
): Promise<{ name: string; url: string; drop: () => Promise<void> }> {
  const name = `plumbline_test_${prefix}_${Date.now().toString(36)}_${process.pid}`;
  const admin = await mysql.createConnection(testDatabaseUrl(""));
  await admin.query(`CREATE DATABASE \`${name}\` CHARACTER SET utf8mb4 COLLATE utf8mb4_unicode_ci`);
  await admin.end();
  return {
    name,
    url: testDatabaseUrl(name),
    drop: async () => {
      const conn = await mysql.createConnection(testDatabaseUrl(""));
      await conn.query(`DROP DATABASE IF EXISTS \`${name}\``);
      await conn.end();
    },
  };
}
