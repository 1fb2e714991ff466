import { createWriteStream } from "node:fs";
import { mkdir, rename, rm, stat } from "node:fs/promises";
import path from "node:path";
import { createGzip } from "node:zlib";
import { countDumpRows } from "./count-dump-rows";
import { dumpArguments } from "./dump-arguments";
import { parseDatabaseUrl } from "./parse-database-url";
import { runClient } from "./run-client";
import { withClientOptionFile } from "./with-client-option-file";

/** What a backup wrote: the file, its size, and the rows per table counted in the file. */
export type BackupResult = {
  file: string;
  database: string;
  bytes: number;
  rows: Map<string, number>;
};

/**
 * Dump the database `databaseUrl` names with `mariadb-dump` (one consistent snapshot, no table
 * locks: `dumpArguments`) into `file`, gzip-compressed and readable by its owner only. The dump
 * goes to `<file>.partial` first and is renamed only once it is whole, then read back to count
 * its rows, so a file under the final name always decompresses and ends with the dump's
 * closing line.
 */
export async function backupDatabase(opts: {
  databaseUrl: string;
  file: string;
}): Promise<BackupResult> {
  const target = parseDatabaseUrl(opts.databaseUrl);
  const file = path.resolve(opts.file);
  const partial = `${file}.partial`;
  await mkdir(path.dirname(file), { recursive: true });
  try {
    await withClientOptionFile(target, (optionFile) =>
      runClient({
        command: "mariadb-dump",
        args: dumpArguments(optionFile, target.database),
        output: [createGzip(), createWriteStream(partial, { mode: 0o600 })],
      }),
    );
  } catch (error) {
    await rm(partial, { force: true });
    throw error;
  }
  const contents = await countDumpRows(partial);
  if (!contents.completed) {
    await rm(partial, { force: true });
    throw new Error("mariadb-dump finished without its closing line; no backup was kept");
  }
  await rename(partial, file);
  return { file, database: target.database, bytes: (await stat(file)).size, rows: contents.rows };
}
