import { execFile } from "node:child_process";
import { readdirSync, readFileSync, statSync } from "node:fs";
import { mkdtemp, rm } from "node:fs/promises";
import { tmpdir } from "node:os";
import path from "node:path";
import { gunzipSync } from "node:zlib";
import mysql from "mysql2/promise";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { withClientOptionFile } from "../../lib/backup/with-client-option-file";
import { compareTableFingerprints } from "../support/compare-table-fingerprints";
import { countAllRows } from "../support/count-all-rows";
import { prepareDatabase } from "../support/prepare-database";
import { tableFingerprints } from "../support/table-fingerprints";
import { createTestDatabase } from "../support/test-database";
import { testDatabaseUrl, testPorts } from "../support/test-env";

// `npm run db:backup` / `npm run db:restore` run for real (tsx, Debian's mariadb-dump and
// mariadb) on a scratch copy of the demo day, then every table is compared with the original.

const root = path.resolve(import.meta.dirname, "../..");
const tsx = path.join(root, "node_modules/.bin/tsx");

type Run = { code: number; stdout: string; stderr: string };

/** Run one of the scripts as `npm run` would, with DATABASE_URL set; never throws. */
function runScript(script: string, args: string[], databaseUrl: string): Promise<Run> {
  return new Promise((resolve) => {
    execFile(
      tsx,
      [path.join(root, "scripts", script), ...args],
      { cwd: root, env: { ...process.env, DATABASE_URL: databaseUrl }, timeout: 60_000 },
      (error, stdout, stderr) => {
        const code = error ? (typeof error.code === "number" ? error.code : -1) : 0;
        resolve({ code, stdout, stderr });
      },
    );
  });
}

/** The `  table   rows` lines a script printed, as a map (the total line left out). */
function printedRowCounts(stdout: string): Record<string, number> {
  const counts: Record<string, number> = {};
  for (const match of stdout.matchAll(/^ {2}(\S+) +(\d+)$/gm)) {
    if (match[1] && match[2] && match[1] !== "total") counts[match[1]] = Number(match[2]);
  }
  return counts;
}

/** Every table the committed migrations create (drizzle-kit writes `CREATE TABLE \`name\``). */
function migratedTables(): string[] {
  const folder = path.join(root, "db/migrations");
  return readdirSync(folder)
    .filter((f) => f.endsWith(".sql"))
    .flatMap((f) =>
      [...readFileSync(path.join(folder, f), "utf8").matchAll(/CREATE TABLE `([^`]+)`/g)].map(
        (m) => m[1] ?? "",
      ),
    );
}

/**
 * Wait until the server has let go of every connection this test opened to `database` (a client
 * sees its socket close a moment before the server drops the session from its process list),
 * so restore's "in use" check sees only what the test means it to. Bounded: 5 s.
 */
async function untilUnused(database: string): Promise<void> {
  const conn = await mysql.createConnection({ uri: testDatabaseUrl("") });
  try {
    for (let tries = 0; tries < 50; tries++) {
      const [[row]] = await conn.query<mysql.RowDataPacket[]>(
        "select count(*) as n from information_schema.processlist where db = ?",
        [database],
      );
      if (Number(row?.n) === 0) return;
      await new Promise((resolve) => setTimeout(resolve, 100));
    }
    throw new Error(`connections to ${database} still open after 5 s`);
  } finally {
    await conn.end();
  }
}

describe("backup and restore of an event day (npm run db:backup / db:restore)", () => {
  let source: Awaited<ReturnType<typeof createTestDatabase>>;
  let copy: Awaited<ReturnType<typeof createTestDatabase>>;
  let folder: string;
  let file: string;

  beforeAll(async () => {
    source = await createTestDatabase("bksrc");
    await prepareDatabase(source.url);
    copy = await createTestDatabase("bkcopy");
    folder = await mkdtemp(path.join(tmpdir(), "plumbline-backup-test-"));
    file = path.join(folder, "day.sql.gz");
  }, 120_000);

  afterAll(async () => {
    await Promise.allSettled([source?.drop(), copy?.drop()]);
    if (folder) await rm(folder, { recursive: true, force: true });
  });

  it("hands the clients their password through an option file they read back exactly", async () => {
    // Source: MariaDB docs, "Configuring MariaDB with Option Files" (from memory): values may be
    // quoted, with escapes such as \\ and \n; the client's own --print-defaults shows what it read.
    const password = `q"x\\y#z 'w\nend`;
    const target = {
      user: "a b",
      password,
      host: "127.0.0.1",
      port: testPorts.db,
      database: "none",
    };
    let optionFile = "";
    const printed = await withClientOptionFile(target, async (f) => {
      optionFile = f;
      // Source: POSIX stat modes — 0600 is read and write for the owner only.
      expect(statSync(f).mode & 0o777).toBe(0o600);
      return new Promise<string>((resolve, reject) =>
        execFile("mariadb", [`--defaults-extra-file=${f}`, "--print-defaults"], (e, out) =>
          e ? reject(e) : resolve(out),
        ),
      );
    });
    expect(printed).toContain(
      `--user=a b --password=${password} --host=127.0.0.1 --port=${testPorts.db} --protocol=TCP`,
    );
    expect(() => statSync(optionFile)).toThrow(/ENOENT/);
  });

  it("backs up while a write is open, without waiting for it and without its uncommitted change", async () => {
    // Source: MariaDB docs, mariadb-dump --single-transaction
    // (https://mariadb.com/docs/server/ref/mdb/cli/mariadb-dump/single-transaction): "Creates a
    // consistent snapshot by dumping all tables in a single transaction" and turns off
    // --lock-tables. A dump that took table locks instead (mariadb-dump's default) would wait
    // here until the write ends: tried by hand, it was still waiting when killed after 8 s.
    const writer = await mysql.createConnection({ uri: source.url });
    let backup: Run;
    try {
      // A committed value with a line break followed by what looks like a row: the file's row
      // count must not take it for one. Source: mariadb-dump escapes string values with
      // mysql_real_escape_string, which writes a newline as \n (MariaDB Connector/C docs, from
      // memory).
      await writer.query("update clubs set name = concat(name, ?)", [
        "\nINSERT INTO `clubs` VALUES ('not a row');",
      ]);
      await writer.beginTransaction();
      await writer.query("update clubs set name = 'UNCOMMITTED-CLUB-NAME'");
      backup = await runScript("db-backup.ts", [file], source.url);
    } finally {
      await writer.rollback();
      await writer.end();
    }
    expect(backup.stderr).toBe("");
    expect(backup.code).toBe(0);
    expect(backup.stdout).toContain(file);
    expect(statSync(file).mode & 0o777).toBe(0o600);
    const dump = gunzipSync(readFileSync(file)).toString("utf8");
    expect(dump).not.toContain("UNCOMMITTED-CLUB-NAME");
    expect(dump).toMatch(/^-- Dump completed/m);
    // The rows it printed (counted in the file) are the rows of every table in the source.
    const rows = await countAllRows(source.url);
    expect(printedRowCounts(backup.stdout)).toEqual(rows);
    expect(Object.values(rows).reduce((a, b) => a + b, 0)).toBeGreaterThan(0);
  }, 120_000);

  it("restores into a fresh database whose every table matches: rows, checksum, definition", async () => {
    await untilUnused(copy.name);
    const restore = await runScript("db-restore.ts", [file, "--database", copy.name], source.url);
    expect(restore.stderr).toBe("");
    expect(restore.code).toBe(0);
    const original = await tableFingerprints(source.url);
    expect(printedRowCounts(restore.stdout)).toEqual(
      Object.fromEntries([...original].map(([t, f]) => [t, f.rows])),
    );
    // Every table the migrations make (and drizzle's own journal) is among those compared.
    expect([...original.keys()]).toEqual(
      expect.arrayContaining([...migratedTables(), "__drizzle_migrations"]),
    );
    expect(compareTableFingerprints(original, await tableFingerprints(copy.url))).toEqual([]);
  }, 120_000);

  it("the comparison names a table whose copy differs in one value", async () => {
    const conn = await mysql.createConnection({ uri: copy.url });
    try {
      await conn.query(
        "update entries set lap_time_estimate_ms = coalesce(lap_time_estimate_ms, 0) + 1 order by id limit 1",
      );
    } finally {
      await conn.end();
    }
    const differences = compareTableFingerprints(
      await tableFingerprints(source.url),
      await tableFingerprints(copy.url),
    );
    expect(differences).toEqual([{ table: "entries", what: "checksum" }]);
  });

  it("refuses a database in use or not empty, and replaces it only with --force", async () => {
    const user = await mysql.createConnection({ uri: copy.url });
    let inUse: Run;
    try {
      // A table a newer schema would have: --force must not leave it behind.
      await user.query("create table later_schema_table (id int primary key)");
      inUse = await runScript(
        "db-restore.ts",
        [file, "--database", copy.name, "--force"],
        source.url,
      );
    } finally {
      await user.end();
    }
    expect(inUse.code).toBe(1);
    expect(inUse.stderr).toMatch(/refused: 1 other connection is using .*stop Plumbline/);

    await untilUnused(copy.name);
    const refused = await runScript("db-restore.ts", [file, "--database", copy.name], source.url);
    expect(refused.code).toBe(1);
    expect(refused.stderr).toMatch(/refused: .* is not empty .* with --force to replace it/);
    const original = await tableFingerprints(source.url);
    // Nothing was changed: the copy still has the value the test before changed, and the table.
    expect(compareTableFingerprints(original, await tableFingerprints(copy.url))).toEqual([
      { table: "entries", what: "checksum" },
      { table: "later_schema_table", what: "extra" },
    ]);

    await untilUnused(copy.name);
    const forced = await runScript(
      "db-restore.ts",
      [file, "--database", copy.name, "--force"],
      source.url,
    );
    expect(forced.stderr).toBe("");
    expect(forced.code).toBe(0);
    expect(compareTableFingerprints(original, await tableFingerprints(copy.url))).toEqual([]);
  }, 120_000);
});
