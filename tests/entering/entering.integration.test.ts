// Entering an event against the real app and MariaDB: capacity and the waiting list under
// concurrency, the entry window, a car entered twice, and a co-driver's invitation accepted.
// Every entry goes through the entry form's server action over HTTP, as the page sends it.
import { afterAll, beforeAll, describe, expect, inject, it } from "vitest";
import { callServerAction } from "../support/call-server-action";
import { linkIn, waitForMail } from "../support/mailbox";
import { queryTestDb } from "../support/query-test-db";
import {
  ACCEPT,
  type Entrant,
  enter,
  entriesOf,
  INVITE,
  makeEntrants,
  makeTestEvent,
} from "./entering-fixtures";

const appUrl = inject("appUrl");
const databaseUrl = inject("databaseUrl");
const mailboxUrl = inject("mailboxUrl");

const CAPACITY = 3;

/** The action went through: Next answers a redirecting action with the target page (200), and
 *  a refusal with the form's error state. */
function expectTaken(answer: { status: number; text: string }) {
  expect(answer.status, answer.text.slice(0, 300)).toBe(200);
  expect(answer.text).not.toMatch(/"status":"error"/);
}
let event: { id: string; slug: string };
let people: Entrant[];

beforeAll(async () => {
  event = await makeTestEvent(databaseUrl, { capacity: CAPACITY, label: "race" });
  people = await makeEntrants(appUrl, databaseUrl, { count: CAPACITY - 1 + 20, label: "race" });
}, 120_000);

afterAll(async () => {
  // Leave the shared database as this file found it: its entries gone, its events finished (they
  // stay for the mail log that names them) so no list of open events shows them.
  await queryTestDb(
    databaseUrl,
    "delete i from co_driver_invites i join entries e on e.id = i.entry_id join events v on v.id = e.event_id where v.slug like 'entering-%'",
  );
  await queryTestDb(
    databaseUrl,
    "delete e from entries e join events v on v.id = e.event_id where v.slug like 'entering-%'",
  );
  await queryTestDb(
    databaseUrl,
    "update events set status = 'finished' where slug like 'entering-%'",
  );
});

describe("capacity and the waiting list", () => {
  it("20 entries at once for the last place: one gets it, 19 wait in order 1..19", async () => {
    // Fill all but the last place first, one at a time: car numbers 2 and 3.
    for (const who of people.slice(0, CAPACITY - 1)) {
      const answer = await enter(who, event);
      expectTaken(answer);
    }
    const before = await entriesOf(databaseUrl, event.id);
    expect(before.map((e) => e.car_number)).toEqual([2, 3]);

    const racers = people.slice(CAPACITY - 1);
    expect(racers).toHaveLength(20);
    const answers = await Promise.all(racers.map((who) => enter(who, event)));
    for (const a of answers) expectTaken(a);

    const rows = await entriesOf(databaseUrl, event.id);
    expect(rows).toHaveLength(CAPACITY - 1 + 20);
    const entered = rows.filter((r) => r.status === "entered");
    const waiting = rows.filter((r) => r.status === "waiting");
    // Never over capacity: exactly the last place taken.
    expect(entered).toHaveLength(CAPACITY);
    expect(entered.every((r) => r.waiting_seq === null)).toBe(true);
    // The rest in one line, no gaps and no place given twice.
    expect(waiting.map((r) => r.waiting_seq).sort((a, b) => (a ?? 0) - (b ?? 0))).toEqual(
      Array.from({ length: 19 }, (_, i) => i + 1),
    );
    // Car numbers: the lowest free from 2 up, each once (our rule, issue 11).
    expect(rows.map((r) => r.car_number).sort((a, b) => a - b)).toEqual(
      Array.from({ length: CAPACITY - 1 + 20 }, (_, i) => i + 2),
    );
    // One entry-received e-mail queued per entry; a waiting one names its place.
    const mails = await queryTestDb<{ dedupe_key: string; subject: string }>(
      databaseUrl,
      `select dedupe_key, json_unquote(json_extract(payload, '$.subject')) as subject from jobs
       where dedupe_key in (${rows.map(() => "?").join(",")})`,
      rows.map((r) => `entry-received:${r.id}`),
    );
    expect(mails).toHaveLength(rows.length);
    for (const w of waiting) {
      const mail = mails.find((m) => m.dedupe_key === `entry-received:${w.id}`);
      expect(mail?.subject).toBe(`Waiting list, place ${w.waiting_seq}: Test race`);
    }
  }, 120_000);

  it("the waiting list is shown on the entry page with its place", async () => {
    const rows = await entriesOf(databaseUrl, event.id);
    const last = rows.find((r) => r.waiting_seq === 19);
    const who = people.find((p) => p.userId === last?.driver_id);
    if (!last || !who) throw new Error("no waiting entry");
    const html = await (await who.session.fetch(`/entries/${last.id}`)).text();
    expect(html).toContain("On the waiting list: place 19.");
  });

  it("the same car cannot enter twice", async () => {
    const who = people[0] as Entrant;
    const answer = await enter(who, event);
    expect(answer.status).toBe(200);
    expect(answer.text).toContain("This car is already entered in this event.");
    expect(
      (await entriesOf(databaseUrl, event.id)).filter((r) => r.car_id === who.carId),
    ).toHaveLength(1);
  });

  it("a car of someone else's garage is refused", async () => {
    const [a, b] = people as [Entrant, Entrant];
    const other = await makeTestEvent(databaseUrl, { capacity: 5, label: "theft" });
    const answer = await enter(a, other, { carId: b.carId });
    expect(answer.text).toContain("Choose one of your cars");
    expect(await entriesOf(databaseUrl, other.id)).toHaveLength(0);
  });
});

describe("the entry window", () => {
  it("is refused before it opens and after it closes, and taken inside it", async () => {
    const windowed = await makeTestEvent(databaseUrl, { capacity: 5, label: "window" });
    const [who] = await makeEntrants(appUrl, databaseUrl, { count: 1, label: "window" });
    if (!who) throw new Error("no entrant");
    const setWindow = (openSql: string, closeSql: string) =>
      queryTestDb(
        databaseUrl,
        `update events set entries_open_at = ${openSql}, entries_close_at = ${closeSql} where id = ?`,
        [windowed.id],
      );
    await setWindow("utc_timestamp(3) + interval 1 hour", "utc_timestamp(3) + interval 2 day");
    let answer = await enter(who, windowed);
    expect(answer.text).toContain("Entries for this event have not opened yet.");
    await setWindow("utc_timestamp(3) - interval 2 day", "utc_timestamp(3) - interval 1 minute");
    answer = await enter(who, windowed);
    expect(answer.text).toContain("Entries for this event have closed.");
    await queryTestDb(databaseUrl, "update events set status = 'entries-closed' where id = ?", [
      windowed.id,
    ]);
    await setWindow("utc_timestamp(3) - interval 2 day", "utc_timestamp(3) + interval 1 day");
    answer = await enter(who, windowed);
    expect(answer.text).toContain("This event is not taking entries.");
    expect(await entriesOf(databaseUrl, windowed.id)).toHaveLength(0);
    await queryTestDb(databaseUrl, "update events set status = 'entries-open' where id = ?", [
      windowed.id,
    ]);
    answer = await enter(who, windowed);
    expectTaken(answer);
    expect(await entriesOf(databaseUrl, windowed.id)).toHaveLength(1);
  }, 60_000);
});

describe("a co-driver", () => {
  it("is invited by e-mail, accepts from their own account and sees the entry in their garage", async () => {
    const shared = await makeTestEvent(databaseUrl, { capacity: 5, label: "shared" });
    const [driver, co, stranger] = await makeEntrants(appUrl, databaseUrl, {
      count: 3,
      label: "shared",
    });
    if (!driver || !co || !stranger) throw new Error("no entrants");
    const since = Date.now();
    const answer = await enter(driver, shared, { coDriverEmail: co.email.toUpperCase() });
    expectTaken(answer);
    const [row] = await entriesOf(databaseUrl, shared.id);
    if (!row) throw new Error("no entry");
    // Only the SHA-256 of the token is stored: 64 hex characters, never the token.
    const [invite] = await queryTestDb<{
      email: string;
      token_hash: string;
      expires_at: Date;
      created_at: Date;
    }>(
      databaseUrl,
      "select email, token_hash, expires_at, created_at from co_driver_invites where entry_id = ?",
      [row.id],
    );
    expect(invite?.email).toBe(co.email);
    expect(invite?.token_hash).toMatch(/^[0-9a-f]{64}$/);
    expect((invite?.expires_at.getTime() ?? 0) - (invite?.created_at.getTime() ?? 0)).toBe(
      14 * 86_400_000,
    );
    // The worker sends it; the link is in the mail.
    const [mail] = await waitForMail(
      mailboxUrl,
      since,
      (m) => m.to.includes(co.email) && m.subject.includes("co-drive"),
    );
    const link = mail ? linkIn(mail) : undefined;
    expect(link).toMatch(/\/invites\/[A-Za-z0-9_-]{43}$/);
    const token = link?.split("/invites/")[1] ?? "";
    expect(token).not.toBe(invite?.token_hash);

    // The driver cannot accept their own invitation.
    const own = await callServerAction(driver.session, {
      action: ACCEPT,
      page: `/invites/${token}`,
      state: { status: "idle" },
      fields: { token, lapTime: "1:55", experience: "advanced" },
    });
    expect(own.text).toContain("You are this car's driver");

    const accepted = await callServerAction(co.session, {
      action: ACCEPT,
      page: `/invites/${token}`,
      state: { status: "idle" },
      fields: { token, lapTime: "1:55.5", experience: "advanced" },
    });
    expectTaken(accepted);
    const [after] = await queryTestDb<{
      co_driver_id: string;
      co_driver_lap_time_estimate_ms: number;
      co_driver_experience: string;
    }>(
      databaseUrl,
      "select co_driver_id, co_driver_lap_time_estimate_ms, co_driver_experience from entries where id = ?",
      [row.id],
    );
    expect(after).toEqual({
      co_driver_id: co.userId,
      co_driver_lap_time_estimate_ms: 115_500,
      co_driver_experience: "advanced",
    });
    // One co-driver per entry: the link does nothing more for anyone.
    const again = await callServerAction(stranger.session, {
      action: ACCEPT,
      page: `/invites/${token}`,
      state: { status: "idle" },
      fields: { token, lapTime: "1:50", experience: "expert" },
    });
    expect(again.text).toContain("This invitation has been accepted already.");
    // And a new invitation is refused while the entry has its co-driver.
    const reinvite = await callServerAction(driver.session, {
      action: INVITE,
      page: `/entries/${row.id}`,
      state: { status: "idle" },
      fields: { entryId: row.id, coDriverEmail: stranger.email },
    });
    expect(reinvite.text).toContain("This entry has a co-driver already.");

    // The co-driver's garage lists the entry and its page opens for them.
    const garage = await (await co.session.fetch("/garage")).text();
    expect(garage).toContain(`/entries/${row.id}`);
    expect(garage).toContain("Test shared");
    const page = await co.session.fetch(`/entries/${row.id}`);
    expect(page.status).toBe(200);
    const html = await page.text();
    expect(html).toContain('data-testid="step-co-driver" data-state="done"');
    expect(html).toContain("estimate 1:55.5");
  }, 60_000);

  it("a new invitation closes the old one; only the driver may send one", async () => {
    const shared = await makeTestEvent(databaseUrl, { capacity: 5, label: "reinvite" });
    const [driver, first, second] = await makeEntrants(appUrl, databaseUrl, {
      count: 3,
      label: "reinvite",
    });
    if (!driver || !first || !second) throw new Error("no entrants");
    await enter(driver, shared, { coDriverEmail: first.email });
    const [row] = await entriesOf(databaseUrl, shared.id);
    if (!row) throw new Error("no entry");
    const notTheirs = await callServerAction(first.session, {
      action: INVITE,
      page: `/entries/${row.id}`,
      state: { status: "idle" },
      fields: { entryId: row.id, coDriverEmail: second.email },
    });
    expect(notTheirs.text).toContain("Only the entry's driver");
    const resent = await callServerAction(driver.session, {
      action: INVITE,
      page: `/entries/${row.id}`,
      state: { status: "idle" },
      fields: { entryId: row.id, coDriverEmail: second.email },
    });
    expect(resent.text).toContain(`Invitation sent to ${second.email}`);
    const invites = await queryTestDb<{ email: string; closed_at: Date | null }>(
      databaseUrl,
      "select email, closed_at from co_driver_invites where entry_id = ? order by created_at",
      [row.id],
    );
    expect(invites.map((i) => [i.email, i.closed_at !== null])).toEqual([
      [first.email, true],
      [second.email, false],
    ]);
  }, 60_000);
});
