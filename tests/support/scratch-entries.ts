import { randomUUID } from "node:crypto";
import { queryTestDb } from "./query-test-db";
import { waitForQueueIdle } from "./wait-for-queue-idle";

/**
 * Entries of the test event that only one test file uses: copies of an existing entry (same
 * car, drivers and class, or those of `templateId`) under car numbers from 900 up, so a test that writes to many cars
 * leaves the demo's own cars, which other files read, as they were. Remove them afterwards.
 */
export async function makeScratchEntries(
  databaseUrl: string,
  eventId: string,
  count: number,
  templateId?: string,
): Promise<string[]> {
  const columns = (
    await queryTestDb<{ name: string }>(
      databaseUrl,
      `select column_name as name from information_schema.columns
        where table_schema = database() and table_name = 'entries' order by ordinal_position`,
    )
  )
    .map((c) => c.name)
    .filter((c) => c !== "id" && c !== "car_number");
  const [template] = templateId
    ? [{ id: templateId }]
    : await queryTestDb<{ id: string }>(
        databaseUrl,
        "select id from entries where event_id = ? and status = 'entered' order by car_number limit 1",
        [eventId],
      );
  if (!template) throw new Error("no entry to copy");
  const ids: string[] = [];
  for (let i = 0; i < count; i += 1) {
    const id = randomUUID();
    const list = columns.map((c) => `\`${c}\``).join(", ");
    await queryTestDb(
      databaseUrl,
      `insert into entries (id, car_number, ${list}) select ?, ?, ${list} from entries where id = ?`,
      [id, 900 + nextNumber++, template.id],
    );
    ids.push(id);
  }
  return ids;
}

let nextNumber = Math.floor(Math.random() * 50) * 20;

/** Take scratch entries out again, with every row that names them. */
export async function removeScratchEntries(databaseUrl: string, ids: string[]): Promise<void> {
  if (ids.length === 0) return;
  // The worker may still be re-deriving their verdicts: let it finish, or it writes a verdict
  // row for an entry this is deleting.
  await waitForQueueIdle(databaseUrl);
  const tables = await queryTestDb<{ name: string }>(
    databaseUrl,
    `select table_name as name from information_schema.columns
      where table_schema = database() and column_name = 'entry_id' and table_name <> 'entries'`,
  );
  const marks = ids.map(() => "?").join(", ");
  for (const { name } of tables) {
    await queryTestDb(databaseUrl, `delete from \`${name}\` where entry_id in (${marks})`, ids);
  }
  await queryTestDb(databaseUrl, `delete from entries where id in (${marks})`, ids);
}
