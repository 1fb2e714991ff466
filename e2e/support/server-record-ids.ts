import { queryTestDb } from "../../tests/support/query-test-db";
import { e2eDatabaseUrl } from "./e2e-database-url";

/** The ids of every record the server stored for these entries (read from its database), sorted. */
export async function serverRecordIds(entryIds: string[]): Promise<string[]> {
  if (entryIds.length === 0) return [];
  const rows = await queryTestDb<{ id: string }>(
    e2eDatabaseUrl(),
    `select id from records where entry_id in (${entryIds.map(() => "?").join(", ")}) order by id`,
    entryIds,
  );
  return rows.map((r) => r.id);
}
