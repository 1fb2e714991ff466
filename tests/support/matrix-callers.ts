import { randomUUID } from "node:crypto";
import { demo } from "./demo-accounts";
import { HttpSession } from "./http-session";
import { queryTestDb } from "./query-test-db";

const OUTSIDER_EMAIL = "chief@other-club.test";

/**
 * Take out the second event and its official again, so every other test file still finds the
 * demo event as the only one.
 */
export async function removeOutsider(databaseUrl: string): Promise<void> {
  const [outsider] = await queryTestDb<{ id: string }>(
    databaseUrl,
    "select id from users where email = ?",
    [OUTSIDER_EMAIL],
  );
  if (!outsider) return;
  const events = await queryTestDb<{ event_id: string }>(
    databaseUrl,
    "select event_id from event_officials where user_id = ?",
    [outsider.id],
  );
  await queryTestDb(databaseUrl, "delete from event_officials where user_id = ?", [outsider.id]);
  for (const { event_id } of events) {
    await queryTestDb(databaseUrl, "delete from event_pass_keys where event_id = ?", [event_id]);
    await queryTestDb(databaseUrl, "delete from events where id = ?", [event_id]);
  }
  await queryTestDb(databaseUrl, "delete from users where id = ?", [outsider.id]);
}

/** Everyone the authorization matrix asks as. */
export const callerNames = [
  "anonymous",
  "owner",
  "otherEntrant",
  "scrutineer",
  "chief",
  "clerk",
  "registrar",
  "organizer",
  "outsider",
] as const;
export type CallerName = (typeof callerNames)[number];

/**
 * A signed-in session for each caller: the demo's officials and car 7's driver ("owner"); the
 * driver of another car in the same event ("otherEntrant"); and the chief scrutineer of a second
 * event made here ("outsider"). The extra accounts get the demo password's hash (test data).
 */
export async function matrixCallers(appUrl: string, databaseUrl: string) {
  const [event] = await queryTestDb<{ id: string }>(
    databaseUrl,
    "select id from events order by created_at, id limit 1",
  );
  if (!event) throw new Error("no event");
  const [owner] = await queryTestDb<{ id: string; password_hash: string }>(
    databaseUrl,
    "select id, password_hash from users where email = ?",
    [demo.entrant],
  );
  if (!owner) throw new Error("no demo entrant");
  const [car7] = await queryTestDb<{ id: string }>(
    databaseUrl,
    "select id from entries where event_id = ? and car_number = 7",
    [event.id],
  );
  const [other] = await queryTestDb<{ id: string; email: string }>(
    databaseUrl,
    `select u.id, u.email from entries e join users u on u.id = e.driver_id
      where e.event_id = ? and e.car_number <> 7 and u.id <> ? order by e.car_number limit 1`,
    [event.id, owner.id],
  );
  if (!other || !car7) throw new Error("no second driver");
  await queryTestDb(databaseUrl, "update users set password_hash = ? where id = ?", [
    owner.password_hash,
    other.id,
  ]);

  const outsiderEmail = OUTSIDER_EMAIL;
  const [known] = await queryTestDb<{ id: string }>(
    databaseUrl,
    "select id from users where email = ?",
    [outsiderEmail],
  );
  if (!known) {
    const otherEvent = randomUUID();
    const outsider = randomUUID();
    await queryTestDb(
      databaseUrl,
      `insert into events (id, club_id, venue_id, name, slug, event_date, time_zone, unit_system,
        status, rule_set_version_id, entry_fee_minor, currency, capacity, created_at, updated_at)
       select ?, club_id, venue_id, 'Another club day', ?, event_date, time_zone, unit_system,
        status, rule_set_version_id, entry_fee_minor, currency, capacity, now(), now() from events
        where id = ?`,
      [otherEvent, `another-day-${otherEvent.slice(0, 8)}`, event.id],
    );
    await queryTestDb(
      databaseUrl,
      "insert into users (id, name, email, password_hash, created_at) values (?, ?, ?, ?, now())",
      [outsider, "Outside Official", outsiderEmail, owner.password_hash],
    );
    await queryTestDb(
      databaseUrl,
      "insert into event_officials (event_id, user_id, role, created_at) values (?, ?, 'chief-scrutineer', now())",
      [otherEvent, outsider],
    );
  }

  const emails: Record<Exclude<CallerName, "anonymous">, string> = {
    owner: demo.entrant,
    otherEntrant: other.email,
    scrutineer: demo.scrutineer,
    chief: demo.chief,
    clerk: demo.clerk,
    registrar: demo.registrar,
    organizer: demo.organizer,
    outsider: outsiderEmail,
  };
  const sessions = {} as Record<CallerName, HttpSession>;
  sessions.anonymous = new HttpSession(appUrl);
  for (const [name, email] of Object.entries(emails)) {
    const session = new HttpSession(appUrl);
    await session.signInWithPassword(email, demo.password);
    if (!session.hasCookie("authjs.session-token")) throw new Error(`${name} could not sign in`);
    sessions[name as CallerName] = session;
  }
  return { eventId: event.id, ownEntryId: car7.id, sessions };
}
