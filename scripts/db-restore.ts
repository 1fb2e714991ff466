// npm run db:restore -- <file> [--database <name>] [--force] — load a backup made by
// db:backup into DATABASE_URL's database (or --database on the same server) and print the rows.
import { parseArgs } from "node:util";
import { formatRowCounts } from "../lib/backup/format-row-counts";
import { restoreDatabase } from "../lib/backup/restore-database";
import { env } from "../lib/env";

const usage = "usage: npm run db:restore -- <file.sql.gz> [--database <name>] [--force]";
let parsed: ReturnType<typeof readArguments>;
try {
  parsed = readArguments();
} catch (error) {
  console.error(`[restore] ${(error as Error).message}\n${usage}`);
  process.exit(2);
}
const file = parsed.positionals[0];
if (!file || parsed.positionals.length > 1) {
  console.error(usage);
  process.exit(2);
}

try {
  const result = await restoreDatabase({
    databaseUrl: env.DATABASE_URL,
    file,
    database: parsed.values.database,
    force: parsed.values.force,
  });
  if (result.status === "refused") {
    console.error(`[restore] refused: ${result.reason}`);
    process.exit(1);
  }
  console.log(`[restore] loaded ${file} into ${result.database}; rows per table now:`);
  for (const line of formatRowCounts(result.rows)) console.log(line);
  if (result.mismatches.length > 0) {
    for (const m of result.mismatches) {
      console.error(
        `[restore] ${m.table}: the file holds ${m.inFile} rows but ${m.loaded ?? "no table"} loaded`,
      );
    }
    process.exit(1);
  }
  console.log("[restore] every table holds the rows the file holds");
} catch (error) {
  console.error(`[restore] failed: ${(error as Error).message}`);
  process.exit(1);
}

function readArguments() {
  return parseArgs({
    allowPositionals: true,
    options: { database: { type: "string" }, force: { type: "boolean", default: false } },
  });
}
