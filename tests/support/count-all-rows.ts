import { queryTestDb } from "./query-test-db";

/**
 * Rows in every table of the test database (`select count(*)`, exact), but the ones named in
 * `except` (e.g. the sign-in limiter's counters, which count attempts by design).
 */
export async function countAllRows(
  databaseUrl: string,
  except: readonly string[] = [],
): Promise<Record<string, number>> {
  const tables = await queryTestDb<{ name: string }>(
    databaseUrl,
    "select table_name as name from information_schema.tables where table_schema = database() and table_type = 'BASE TABLE' order by table_name",
  );
  const counts: Record<string, number> = {};
  for (const { name } of tables) {
    if (except.includes(name)) continue;
    const [row] = await queryTestDb<{ n: number }>(
      databaseUrl,
      `select count(*) as n from \`${name}\``,
    );
    counts[name] = Number(row?.n ?? 0);
  }
  return counts;
}
