import { randomUUID } from "node:crypto";
import { v7 as uuidv7 } from "uuid";
import { demo } from "./demo-accounts";
import { queryTestDb } from "./query-test-db";
import { waitForQueueIdle } from "./wait-for-queue-idle";

/**
 * An event of the payments tests' own (a copy of the demo's open event under a new id and slug,
 * with the date, capacity and zone a test asks for) so no other test file's event changes, and
 * entries in it for the demo entrant's car. `removePaymentsEvent` takes it all out again.
 */
export async function makePaymentsEvent(
  databaseUrl: string,
  opts: { eventDate: string; capacity?: number; feeMinor?: number },
): Promise<{ eventId: string }> {
  const eventId = uuidv7();
  const columns = await columnsOf(databaseUrl, "events", ["id", "slug", "event_date", "capacity"]);
  const list = columns.map((c) => `\`${c}\``).join(", ");
  await queryTestDb(
    databaseUrl,
    `insert into events (id, slug, event_date, capacity, ${list})
       select ?, ?, ?, ?, ${list} from events where status = 'entries-open' order by created_at limit 1`,
    [eventId, `pay-test-${eventId}`, opts.eventDate, opts.capacity ?? 30],
  );
  if (opts.feeMinor !== undefined) {
    await queryTestDb(databaseUrl, "update events set entry_fee_minor = ? where id = ?", [
      opts.feeMinor,
      eventId,
    ]);
  }
  return { eventId };
}

/** An entry in the event for the demo `driver`'s car (the demo entrant unless said). */
export async function makePaymentsEntry(
  databaseUrl: string,
  opts: {
    eventId: string;
    carNumber: number;
    status?: "entered" | "waiting";
    waitingSeq?: number;
    driverEmail?: string;
  },
): Promise<string> {
  const email = opts.driverEmail ?? demo.entrant;
  const [template] = await queryTestDb<{ id: string }>(
    databaseUrl,
    `select e.id from entries e join users u on u.id = e.driver_id
      where u.email = ? order by e.car_number limit 1`,
    [email],
  );
  if (!template) throw new Error(`no entry of ${email} to copy`);
  const id = randomUUID();
  const columns = await columnsOf(databaseUrl, "entries", [
    "id",
    "event_id",
    "car_number",
    "status",
    "waiting_seq",
    "withdrawn_at",
  ]);
  const list = columns.map((c) => `\`${c}\``).join(", ");
  await queryTestDb(
    databaseUrl,
    `insert into entries (id, event_id, car_number, status, waiting_seq, ${list})
       select ?, ?, ?, ?, ?, ${list} from entries where id = ?`,
    [
      id,
      opts.eventId,
      opts.carNumber,
      opts.status ?? "entered",
      opts.waitingSeq ?? null,
      template.id,
    ],
  );
  return id;
}

/** Take the event out with every row naming it or its entries. */
export async function removePaymentsEvent(databaseUrl: string, eventId: string): Promise<void> {
  await waitForQueueIdle(databaseUrl);
  const tables = await queryTestDb<{ name: string }>(
    databaseUrl,
    `select table_name as name from information_schema.columns
      where table_schema = database() and column_name = 'event_id'
        and table_name not in ('entries', 'events')`,
  );
  for (const { name } of tables) {
    await queryTestDb(databaseUrl, `delete from \`${name}\` where event_id = ?`, [eventId]);
  }
  await queryTestDb(databaseUrl, "delete from entries where event_id = ?", [eventId]);
  await queryTestDb(databaseUrl, "delete from events where id = ?", [eventId]);
}

async function columnsOf(databaseUrl: string, table: string, except: string[]): Promise<string[]> {
  const rows = await queryTestDb<{ name: string }>(
    databaseUrl,
    `select column_name as name from information_schema.columns
      where table_schema = database() and table_name = ? order by ordinal_position`,
    [table],
  );
  return rows.map((r) => r.name).filter((c) => !except.includes(c));
}

/** A date `days` after today's date in UTC, YYYY-MM-DD. */
export function dateInDays(now: Date, days: number): string {
  return new Date(now.getTime() + days * 86_400_000).toISOString().slice(0, 10);
}
