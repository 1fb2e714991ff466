import { randomUUID } from "node:crypto";
import { expect } from "vitest";
import { demo } from "../support/demo-accounts";
import { HttpSession } from "../support/http-session";
import { queryTestDb } from "../support/query-test-db";
import { makeScratchEntries } from "../support/scratch-entries";

/** The demo event (the first made): its id, date and waiver version. */
export async function demoEvent(databaseUrl: string) {
  const [event] = await queryTestDb<{ id: string; event_date: string; waiver_version: string }>(
    databaseUrl,
    "select id, date_format(event_date, '%Y-%m-%d') as event_date, waiver_version from events order by created_at, id limit 1",
  );
  if (!event) throw new Error("no event");
  return event;
}

/** A person of this test file's own (invented), with the demo password; `dateOfBirth` as given. */
export async function makePerson(
  databaseUrl: string,
  { name, dateOfBirth = null }: { name: string; dateOfBirth?: string | null },
) {
  const [entrant] = await queryTestDb<{ password_hash: string }>(
    databaseUrl,
    "select password_hash from users where email = ?",
    [demo.entrant],
  );
  const id = randomUUID();
  const email = `waiver-${id.slice(0, 8)}@waiver.test`;
  await queryTestDb(
    databaseUrl,
    "insert into users (id, name, email, password_hash, date_of_birth, created_at) values (?, ?, ?, ?, ?, utc_timestamp(3))",
    [id, name, email, entrant?.password_hash, dateOfBirth],
  );
  return { id, email, name };
}

/** A scratch entry of the demo event driven by `driverId` (and `coDriverId`), in Kestrel, with
 *  empty declarations; optionally with its fee paid. */
export async function makeEntry(
  databaseUrl: string,
  eventId: string,
  opts: { driverId: string; coDriverId?: string | null; paid?: boolean },
) {
  const [id] = await makeScratchEntries(databaseUrl, eventId, 1);
  if (!id) throw new Error("no scratch entry");
  await queryTestDb(
    databaseUrl,
    "update entries set driver_id = ?, co_driver_id = ?, declared_class = 'kestrel', declarations = '{}', status = 'entered' where id = ?",
    [opts.driverId, opts.coDriverId ?? null, id],
  );
  if (opts.paid) {
    await queryTestDb(
      databaseUrl,
      `insert into payments (id, event_id, entry_id, provider, provider_ref, amount_minor, currency, status, created_at, updated_at)
       values (?, ?, ?, 'demo', ?, 9500, 'GBP', 'paid', utc_timestamp(3), utc_timestamp(3))`,
      [randomUUID(), eventId, id, `waiver-test-${id}`],
    );
  }
  return id;
}

export async function signedIn(appUrl: string, email: string): Promise<HttpSession> {
  const session = new HttpSession(appUrl);
  await session.signInWithPassword(email, demo.password);
  expect(session.hasCookie("authjs.session-token")).toBe(true);
  return session;
}

/** A date of birth that makes a person 16 on `eventDate` (ISO). */
export function sixteenOn(eventDate: string): string {
  return `${Number(eventDate.slice(0, 4)) - 16}${eventDate.slice(4)}`;
}

/** Remove the people this file made (after their entries). */
export async function removePeople(databaseUrl: string, ids: string[]) {
  if (ids.length === 0) return;
  const marks = ids.map(() => "?").join(", ");
  // Rows that name them (their sign-ins in the audit log and the like), found from the foreign keys.
  const refs = await queryTestDb<{ t: string; c: string }>(
    databaseUrl,
    `select table_name as t, column_name as c from information_schema.key_column_usage
      where table_schema = database() and referenced_table_name = 'users' and referenced_column_name = 'id'`,
  );
  for (const { t, c } of refs) {
    await queryTestDb(databaseUrl, `delete from \`${t}\` where \`${c}\` in (${marks})`, ids);
  }
  await queryTestDb(databaseUrl, `delete from users where id in (${marks})`, ids);
}
