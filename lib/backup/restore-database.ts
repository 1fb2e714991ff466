import { createReadStream } from "node:fs";
import path from "node:path";
import { createGunzip } from "node:zlib";
import { countOtherSessions } from "../../db/backup/count-other-sessions";
import { countTableRows } from "../../db/backup/count-table-rows";
import { createDatabaseIfMissing } from "../../db/backup/create-database-if-missing";
import { dropDatabaseObjects } from "../../db/backup/drop-database-objects";
import { listDatabaseObjects } from "../../db/backup/list-database-objects";
import { openServerConnection } from "../../db/backup/open-server-connection";
import { countDumpRows } from "./count-dump-rows";
import { loadArguments } from "./load-arguments";
import { type DatabaseTarget, parseDatabaseUrl } from "./parse-database-url";
import { runClient } from "./run-client";
import { withClientOptionFile } from "./with-client-option-file";

/** A table whose rows after loading are not the rows the file holds. */
export type RowMismatch = { table: string; inFile: number; loaded: number | undefined };

export type RestoreResult =
  | { status: "refused"; database: string; reason: string }
  | {
      status: "restored";
      database: string;
      rows: Map<string, number>;
      mismatches: RowMismatch[];
    };

/**
 * Load a backup made by `backupDatabase` into `database` (default: the one `databaseUrl`
 * names, on the same server with the same account). The file is read through first, so a
 * cut-short or corrupt file changes nothing. Refuses, changing nothing, while other connections
 * use the database (a running app would keep writing) and when it already holds tables, unless
 * `force`, which drops every table and view in it first so nothing of a newer schema stays
 * behind. Afterwards counts the rows of every table and compares them with the file's.
 */
export async function restoreDatabase(opts: {
  databaseUrl: string;
  file: string;
  database?: string;
  force?: boolean;
}): Promise<RestoreResult> {
  const target: DatabaseTarget = {
    ...parseDatabaseUrl(opts.databaseUrl),
    ...(opts.database ? { database: opts.database } : {}),
  };
  const { database } = target;
  const file = path.resolve(opts.file);
  const contents = await countDumpRows(file);
  if (!contents.completed) {
    return {
      status: "refused",
      database,
      reason: `${file} stops before the end of a mariadb-dump file (cut short, or not a backup made by npm run db:backup); ${database} was not changed`,
    };
  }
  const refusal = await prepareTarget(target, opts.force === true);
  if (refusal) return { status: "refused", database, reason: refusal };

  await withClientOptionFile(target, (optionFile) =>
    runClient({
      command: "mariadb",
      args: loadArguments(optionFile, database),
      input: [createReadStream(file), createGunzip()],
    }),
  );

  const connection = await openServerConnection(target);
  try {
    const rows = await countTableRows(connection, database);
    const mismatches = [...contents.rows]
      .filter(([table, inFile]) => rows.get(table) !== inFile)
      .map(([table, inFile]) => ({ table, inFile, loaded: rows.get(table) }));
    return { status: "restored", database, rows, mismatches };
  } finally {
    await connection.end();
  }
}

/** Why the target cannot be loaded now (in words), or undefined once it is empty and exists. */
async function prepareTarget(target: DatabaseTarget, force: boolean): Promise<string | undefined> {
  const { database } = target;
  const connection = await openServerConnection(target);
  try {
    const others = await countOtherSessions(connection, database);
    if (others > 0) {
      return `${others} other connection${others === 1 ? " is" : "s are"} using ${database}: stop Plumbline (the app and its worker) and any other client on it first, then restore`;
    }
    const objects = await listDatabaseObjects(connection, database);
    if (objects.length > 0 && !force) {
      const rows = [...(await countTableRows(connection, database)).values()];
      const total = rows.reduce((sum, n) => sum + n, 0);
      return `${database} is not empty (${objects.length} tables, ${total} rows) and restoring would replace everything in it. Nothing was changed. Back it up first with npm run db:backup, then run the restore again with --force to replace it`;
    }
    if (objects.length > 0) await dropDatabaseObjects(connection, database, objects);
    await createDatabaseIfMissing(connection, database);
    return undefined;
  } finally {
    await connection.end();
  }
}
