// npm run db:backup [-- <file>] — dump DATABASE_URL's database into one gzip file
// (default .data/backups/<database>-<UTC time>.sql.gz) and print the file, its size and rows.
import path from "node:path";
import { parseArgs } from "node:util";
import { backupDatabase } from "../lib/backup/backup-database";
import { backupFileName } from "../lib/backup/backup-file-name";
import { formatByteSize } from "../lib/backup/format-byte-size";
import { formatRowCounts } from "../lib/backup/format-row-counts";
import { parseDatabaseUrl } from "../lib/backup/parse-database-url";
import { env } from "../lib/env";

const root = path.resolve(import.meta.dirname, "..");
const { positionals } = parseArgs({ allowPositionals: true, options: {} });
if (positionals.length > 1) {
  console.error("usage: npm run db:backup [-- <file.sql.gz>]");
  process.exit(2);
}
const { database } = parseDatabaseUrl(env.DATABASE_URL);
// Named by the computer's real clock, not lib/clock's: a backup is a real file, made now.
const file =
  positionals[0] ?? path.join(root, ".data", "backups", backupFileName(database, new Date()));

try {
  const started = performance.now();
  const backup = await backupDatabase({ databaseUrl: env.DATABASE_URL, file });
  const seconds = ((performance.now() - started) / 1000).toFixed(1);
  console.log(`[backup] ${backup.database} → ${backup.file}`);
  console.log(
    `[backup] ${formatByteSize(backup.bytes)} (${backup.bytes} bytes, gzip) in ${seconds} s; rows per table in the file:`,
  );
  for (const line of formatRowCounts(backup.rows)) console.log(line);
  console.log("[backup] copy the file off this computer (USB stick, club drive) before you leave");
} catch (error) {
  console.error(`[backup] failed: ${(error as Error).message}`);
  process.exit(1);
}
