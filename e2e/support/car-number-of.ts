import { queryTestDb } from "../../tests/support/query-test-db";
import { e2eDatabaseUrl } from "./e2e-database-url";

/** An entry's car number, from the server's database. */
export async function carNumberOf(entryId: string): Promise<number> {
  const [row] = await queryTestDb<{ car_number: number }>(
    e2eDatabaseUrl(),
    "select car_number from entries where id = ?",
    [entryId],
  );
  if (!row) throw new Error(`no entry ${entryId}`);
  return row.car_number;
}
