import type mysql from "mysql2/promise";
import { quoteIdentifier } from "./quote-identifier";

/**
 * Every base table of `database` with its exact row count (`count(*)`, not the estimate
 * information_schema keeps), by table name.
 */
export async function countTableRows(
  connection: mysql.Connection,
  database: string,
): Promise<Map<string, number>> {
  const [tables] = await connection.query<mysql.RowDataPacket[]>(
    "select table_name as name from information_schema.tables where table_schema = ? and table_type = 'BASE TABLE' order by table_name",
    [database],
  );
  const rows = new Map<string, number>();
  for (const { name } of tables) {
    const [[counted]] = (await connection.query(
      `select count(*) as n from ${quoteIdentifier(database)}.${quoteIdentifier(name)}`,
    )) as unknown as [{ n: number }[]];
    rows.set(String(name), Number(counted?.n ?? 0));
  }
  return rows;
}
