import mysql from "mysql2/promise";

/** What identifies one table's definition and contents, to compare two copies of a database. */
export type TableFingerprint = { rows: number; checksum: string; definition: string };

/**
 * Every base table of the database `url` names (listed from information_schema), with its exact
 * row count, `CHECKSUM TABLE … EXTENDED` (every row read) and `SHOW CREATE TABLE` text.
 * Source: MariaDB docs, CHECKSUM TABLE (https://mariadb.com/kb/en/checksum-table): "Two identical
 * tables should always match to the same checksum value" (identical: same CREATE statement, same
 * server version) — both copies here live on one server.
 */
export async function tableFingerprints(url: string): Promise<Map<string, TableFingerprint>> {
  const conn = await mysql.createConnection({ uri: url, timezone: "Z" });
  try {
    const [tables] = await conn.query<mysql.RowDataPacket[]>(
      "select table_name as name from information_schema.tables where table_schema = database() and table_type = 'BASE TABLE' order by table_name",
    );
    const fingerprints = new Map<string, TableFingerprint>();
    for (const { name } of tables) {
      const quoted = `\`${String(name).replaceAll("`", "``")}\``;
      const [[counted]] = await conn.query<mysql.RowDataPacket[]>(
        `select count(*) as n from ${quoted}`,
      );
      const [[summed]] = await conn.query<mysql.RowDataPacket[]>(
        `checksum table ${quoted} extended`,
      );
      const [[created]] = await conn.query<mysql.RowDataPacket[]>(`show create table ${quoted}`);
      fingerprints.set(String(name), {
        rows: Number(counted?.n),
        checksum: String(summed?.Checksum),
        definition: String(created?.["Create Table"]),
      });
    }
    return fingerprints;
  } finally {
    await conn.end();
  }
}
