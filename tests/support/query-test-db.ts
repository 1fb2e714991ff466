import mysql from "mysql2/promise";

/** Run one SQL query against the test database directly (to count rows around a request). */
export async function queryTestDb<T = Record<string, unknown>>(
  url: string,
  sql: string,
  params: unknown[] = [],
): Promise<T[]> {
  const conn = await mysql.createConnection({ uri: url, timezone: "Z" });
  try {
    const [rows] = await conn.query(sql, params);
    return rows as T[];
  } finally {
    await conn.end();
  }
}
