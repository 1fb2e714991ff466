/**
 * Arguments for Debian's `mariadb-dump`: one consistent snapshot of one database, read without
 * locking the tables the tech line writes to. Credentials come only from the option file
 * (which must be the first argument), so nothing secret shows in `ps`.
 *
 * - `--single-transaction`: dump every table inside one REPEATABLE READ transaction, a consistent
 *   snapshot of InnoDB tables that does not block writers; it turns `--lock-tables` off
 *   (MariaDB docs, mariadb-dump `--single-transaction`). Do not run migrations meanwhile:
 *   ALTER/DROP/RENAME/TRUNCATE TABLE are not isolated from the snapshot.
 * - `--skip-lock-tables`: said out loud, so no later option turns table locks back on.
 * - `--routines --triggers`: stored code too, should the schema ever gain any. No `--events`:
 *   Plumbline schedules none, and it would fail for an account without the EVENT privilege.
 * - `--skip-extended-insert`: one row per INSERT line, so the rows in a file can be counted
 *   (`countDumpRows`); `--no-autocommit` loads each table in one transaction all the same.
 * - `--hex-blob`: binary values as hex, safe through any text tool.
 * - No `--databases`: the file names no database, so it loads into whichever one restore names.
 */
export function dumpArguments(optionFile: string, database: string): string[] {
  return [
    `--defaults-extra-file=${optionFile}`,
    "--single-transaction",
    "--skip-lock-tables",
    "--routines",
    "--triggers",
    "--skip-extended-insert",
    "--no-autocommit",
    "--hex-blob",
    "--default-character-set=utf8mb4",
    database,
  ];
}
