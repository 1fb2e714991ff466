import type mysql from "mysql2/promise";
import type { DatabaseObject } from "./list-database-objects";
import { quoteIdentifier } from "./quote-identifier";

/**
 * Drop the given tables and views of `database`, foreign keys unchecked for this connection
 * only, so a restore starts from nothing and no table of a newer schema is left behind.
 */
export async function dropDatabaseObjects(
  connection: mysql.Connection,
  database: string,
  objects: DatabaseObject[],
): Promise<void> {
  const names = (kind: DatabaseObject["kind"]) =>
    objects
      .filter((o) => o.kind === kind)
      .map((o) => `${quoteIdentifier(database)}.${quoteIdentifier(o.name)}`);
  await connection.query("set foreign_key_checks = 0");
  try {
    const views = names("view");
    if (views.length > 0) await connection.query(`drop view if exists ${views.join(", ")}`);
    const tables = names("table");
    if (tables.length > 0) await connection.query(`drop table if exists ${tables.join(", ")}`);
  } finally {
    await connection.query("set foreign_key_checks = 1");
  }
}
