import type mysql from "mysql2/promise";

/** A table or view in a database, as information_schema lists it. */
export type DatabaseObject = { name: string; kind: "table" | "view" };

/** The tables and views of `database` (none when the database does not exist). */
export async function listDatabaseObjects(
  connection: mysql.Connection,
  database: string,
): Promise<DatabaseObject[]> {
  const [rows] = await connection.query<mysql.RowDataPacket[]>(
    "select table_name as name, table_type as type from information_schema.tables where table_schema = ? order by table_name",
    [database],
  );
  return rows.map((row) => ({
    name: String(row.name),
    kind: row.type === "VIEW" ? "view" : "table",
  }));
}
