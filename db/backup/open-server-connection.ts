import mysql from "mysql2/promise";
import type { DatabaseTarget } from "../../lib/backup/parse-database-url";

/**
 * One mysql2 connection to the MariaDB server of `target`, on no database in particular (the
 * restore target may not exist yet); queries name their database. Times read as UTC.
 */
export async function openServerConnection(target: DatabaseTarget): Promise<mysql.Connection> {
  return mysql.createConnection({
    host: target.host,
    port: target.port,
    user: target.user,
    password: target.password,
    timezone: "Z",
  });
}
