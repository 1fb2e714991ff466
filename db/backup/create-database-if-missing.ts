import type mysql from "mysql2/promise";
import { quoteIdentifier } from "./quote-identifier";

/** Create `database` with Plumbline's character set and collation unless it exists. */
export async function createDatabaseIfMissing(
  connection: mysql.Connection,
  database: string,
): Promise<void> {
  await connection.query(
    `create database if not exists ${quoteIdentifier(database)} character set utf8mb4 collate utf8mb4_unicode_ci`,
  );
}
