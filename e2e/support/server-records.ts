import { queryTestDb } from "../../tests/support/query-test-db";
import { e2eDatabaseUrl } from "./e2e-database-url";

/**
 * What the server has stored for one entry, read straight from the database (not through the
 * app): the ids of its records and how many photo uploads it noted.
 */
export async function serverRecordsOf(
  entryId: string,
): Promise<{ ids: string[]; uploads: number }> {
  const url = e2eDatabaseUrl();
  const rows = await queryTestDb<{ id: string }>(
    url,
    "select id from records where entry_id = ? order by id",
    [entryId],
  );
  const [uploads] = await queryTestDb<{ n: number }>(
    url,
    "select count(*) as n from uploads where entry_id = ?",
    [entryId],
  );
  return { ids: rows.map((r) => r.id), uploads: Number(uploads?.n ?? 0) };
}
