import { randomUUID } from "node:crypto";
import { v7 as uuidv7 } from "uuid";
import { callServerAction } from "../support/call-server-action";
import { demo } from "../support/demo-accounts";
import { HttpSession } from "../support/http-session";
import { queryTestDb } from "../support/query-test-db";

export const ENTER = "app/events/[slug]/enter/actions.ts#enterEventAction";
export const ACCEPT = "app/invites/[token]/actions.ts#acceptInviteAction";
export const DECLINE = "app/invites/[token]/actions.ts#declineInviteAction";
export const INVITE = "app/(entrant)/entries/[entryId]/actions.ts#inviteCoDriverAction";

/**
 * An event of the test's own, copied from the demo's open event (same club, venue and rule set)
 * under a new slug and the capacity asked for, so filling it disturbs no other test file.
 */
export async function makeTestEvent(
  databaseUrl: string,
  { capacity, label }: { capacity: number; label: string },
): Promise<{ id: string; slug: string }> {
  const id = uuidv7();
  const slug = `entering-${label}-${id.slice(-8)}`;
  await queryTestDb(
    databaseUrl,
    `insert into events (id, club_id, venue_id, name, slug, event_date, time_zone, unit_system, status,
       rule_set_version_id, entry_fee_minor, currency, capacity, entries_open_at, entries_close_at,
       waiver_text, waiver_version, refund_policy, protest_window_minutes, created_at, updated_at)
     select ?, club_id, venue_id, ?, ?, event_date, time_zone, unit_system, 'entries-open',
       rule_set_version_id, entry_fee_minor, currency, ?, utc_timestamp(3) - interval 1 day,
       utc_timestamp(3) + interval 7 day, waiver_text, waiver_version, refund_policy,
       protest_window_minutes, utc_timestamp(3), utc_timestamp(3)
     from events where status = 'entries-open' and slug like 'cinder-vale-winter-%' limit 1`,
    [id, `Test ${label}`, slug, capacity],
  );
  return { id, slug };
}

/** People with a car each (the demo password's hash: test data), signed in. */
export async function makeEntrants(
  appUrl: string,
  databaseUrl: string,
  { count, label }: { count: number; label: string },
) {
  const [model] = await queryTestDb<{ password_hash: string }>(
    databaseUrl,
    "select password_hash from users where email = ?",
    [demo.entrant],
  );
  const people = [];
  for (let i = 0; i < count; i += 1) {
    const userId = randomUUID();
    const carId = uuidv7();
    const email = `${label}-${i}-${userId.slice(0, 6)}@entering.test`;
    await queryTestDb(
      databaseUrl,
      "insert into users (id, name, email, password_hash, created_at) values (?, ?, ?, ?, utc_timestamp(3))",
      [userId, `Entrant ${label} ${i}`, email, model?.password_hash],
    );
    await queryTestDb(
      databaseUrl,
      `insert into cars (id, owner_id, make, model, year, colour, created_at, updated_at)
       values (?, ?, 'Mazda', ?, 2001, 'Silver', utc_timestamp(3), utc_timestamp(3))`,
      [carId, userId, `MX-5 ${label} ${i}`],
    );
    const session = new HttpSession(appUrl);
    await session.signInWithPassword(email, demo.password);
    if (!session.hasCookie("authjs.session-token")) throw new Error(`sign-in failed for ${email}`);
    people.push({ userId, carId, email, session });
  }
  return people;
}

export type Entrant = Awaited<ReturnType<typeof makeEntrants>>[number];

/** Call the entry form's action as the page does. */
export function enter(
  who: Entrant,
  event: { slug: string },
  fields: Partial<Record<string, string>> = {},
) {
  return callServerAction(who.session, {
    action: ENTER,
    page: `/events/${event.slug}/enter`,
    state: { status: "idle" },
    fields: {
      eventSlug: event.slug,
      carId: who.carId,
      classId: "kestrel",
      lapTime: "1:58",
      experience: "novice",
      coDriverEmail: "",
      ...Object.fromEntries(Object.entries(fields).filter(([, v]) => v !== undefined)),
    } as Record<string, string>,
  });
}

export const entriesOf = (databaseUrl: string, eventId: string) =>
  queryTestDb<{
    id: string;
    status: string;
    waiting_seq: number | null;
    car_number: number;
    driver_id: string;
    co_driver_id: string | null;
    car_id: string;
  }>(
    databaseUrl,
    "select id, status, waiting_seq, car_number, driver_id, co_driver_id, car_id from entries where event_id = ? order by car_number",
    [eventId],
  );
