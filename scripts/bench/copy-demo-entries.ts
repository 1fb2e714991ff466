// Scratch cars for the figures that write many records: copies of the demo event's own entries
// (same car, drivers, class and declarations, no records yet) under car numbers from 1000 up, so
// every repetition starts from the same demo and the demo's cars stay as seeded.
import { randomUUID } from "node:crypto";
import type { Pool, RowDataPacket } from "mysql2/promise";
import { removeScratchEntries } from "../../tests/support/scratch-entries";

export type ScratchCar = { entryId: string; driverEmail: string };

let nextCarNumber = 1000;

/** `count` copies of the event's demo entries (taken in car-number order, round and round). */
export async function copyDemoEntries(
  pool: Pool,
  eventId: string,
  count: number,
): Promise<ScratchCar[]> {
  const [columnRows] = await pool.query<RowDataPacket[]>(
    `select column_name as name from information_schema.columns
      where table_schema = database() and table_name = 'entries' order by ordinal_position`,
  );
  const list = columnRows
    .map((c) => String(c.name))
    .filter((c) => c !== "id" && c !== "car_number")
    .map((c) => `\`${c}\``)
    .join(", ");
  const [templates] = await pool.query<RowDataPacket[]>(
    `select e.id, u.email from entries e join users u on u.id = e.driver_id
      where e.event_id = ? and e.status = 'entered' and e.car_number < 1000 order by e.car_number`,
    [eventId],
  );
  if (templates.length === 0) throw new Error("no demo entry to copy");
  const cars: ScratchCar[] = [];
  for (let i = 0; i < count; i += 1) {
    const template = templates[i % templates.length];
    if (!template) break;
    const id = randomUUID();
    await pool.query(
      `insert into entries (id, car_number, ${list}) select ?, ?, ${list} from entries where id = ?`,
      [id, nextCarNumber++, template.id],
    );
    cars.push({ entryId: id, driverEmail: String(template.email) });
  }
  return cars;
}

/** Take the copies out again with every row that names them (records, verdicts, mail, …). */
export async function removeCopies(
  databaseUrl: string,
  cars: readonly ScratchCar[],
): Promise<void> {
  await removeScratchEntries(
    databaseUrl,
    cars.map((c) => c.entryId),
  );
}
