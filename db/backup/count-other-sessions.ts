import type mysql from "mysql2/promise";

/**
 * How many other connections use `database` now (a running app or worker keeps some open).
 * Without the PROCESS privilege the server shows only the same user's connections, which is who
 * Plumbline connects as.
 */
export async function countOtherSessions(
  connection: mysql.Connection,
  database: string,
): Promise<number> {
  const [[row]] = (await connection.query(
    "select count(*) as n from information_schema.processlist where db = ? and id <> connection_id()",
    [database],
  )) as unknown as [{ n: number }[]];
  return Number(row?.n ?? 0);
}
