import "fake-indexeddb/auto";
import { clear } from "idb-keyval";
import { v7 as uuidv7 } from "uuid";
import { afterAll, beforeAll, beforeEach, describe, expect, it } from "vitest";
import { addLocalRecord } from "@/lib/offline/add-local-record";
import { drainOutbox } from "@/lib/offline/drain-outbox";
import { idbStores } from "@/lib/offline/idb-stores";
import { listLocalRecords } from "@/lib/offline/list-local-records";
import { requeueSignedOutRecords } from "@/lib/offline/requeue-signed-out-records";
import { resetOutboxBackoff } from "@/lib/offline/reset-outbox-backoff";
import type { TechRecord } from "@/lib/scrutineer/records/record-schema";
import { demo } from "../support/demo-accounts";
import { HttpSession } from "../support/http-session";
import { listMail, type MailboxMessage } from "../support/mailbox";
import { postSync } from "../support/post-sync";
import { queryTestDb } from "../support/query-test-db";
import { makeScratchEntries } from "../support/scratch-entries";
import { readingRecord } from "../support/tech-fixtures";
import { type FaultStack, startFaultStack } from "./fault-stack";

// The fault matrix of the sync path: each case breaks one part (the app server, MariaDB, the
// worker, the network, the sign-in) in the middle of the tech line's work, then counts — records
// on the phone and in the database, verdict rows, e-mail jobs, mail-log lines and messages the
// mail server received — and requires nothing lost and nothing done twice. Counts, not times.
// The phone is the real outbox code (lib/offline) on fake-indexeddb (npm), talking HTTP to the
// real server; "phones at once" are concurrent requests with their own device ids.

let stack: FaultStack;
let eventId: string;
let chief: HttpSession;
let scrutineer: HttpSession;
let scrutineer2: HttpSession;
let ids: { chief: string; scrutineer: string; scrutineer2: string };
/** Demo cars not held and not yet used by an earlier case: each case takes its own. */
let freeCars: { id: string; recipients: number; carNumber: number }[] = [];

const db = <T = Record<string, unknown>>(sql: string, params: unknown[] = []) =>
  queryTestDb<T>(stack.databaseUrl, sql, params);

function takeCars(n: number) {
  const cars = freeCars.slice(0, n);
  freeCars = freeCars.slice(n);
  if (cars.length < n) throw new Error("the demo has too few waiting cars for the fault matrix");
  return cars;
}

let tick = Date.now() - 60_000;
/** Device times a millisecond apart, never in the future (the server refuses a clock ahead). */
function nextTime(): Date {
  tick += 1;
  return new Date(tick);
}

/** Ids of the records this case made: what it counts in the database. */
let made: string[] = [];

function reading(entryId: string, officialId: string, deviceId: string, n: number): TechRecord {
  const record = readingRecord({
    entryId,
    officialId,
    deviceId,
    dimension: "wingSpanMm",
    valueMm: 1400 + (n % 50) * 0.1,
    at: nextTime(),
  }) as TechRecord;
  made.push(record.id);
  return record;
}

/** The chief scrutineer holds a car: a verdict change that mails its driver (and co-driver). */
function hold(entryId: string): TechRecord {
  const at = nextTime();
  const record = {
    id: uuidv7({ msecs: at.getTime() }),
    kind: "override",
    entryId,
    officialId: ids.chief,
    deviceId: "chief-phone",
    deviceTime: at.toISOString(),
    payload: { status: "held", classId: null, reason: "Fault-matrix test: held at the tech line" },
  } as TechRecord;
  made.push(record.id);
  return record;
}

/** Wait (bounded, 30 s) until the queue has nothing queued or running. */
async function queueSettled() {
  for (let i = 0; i < 300; i += 1) {
    const [row] = await db<{ n: number }>(
      "select count(*) as n from jobs where status in ('queued', 'running')",
    );
    if (Number(row?.n) === 0) return;
    await new Promise((r) => setTimeout(r, 100));
  }
  throw new Error("the job queue did not settle within 30 s");
}

/** Everything countable about some cars, after the queue has settled. */
async function countFor(cars: { id: string; carNumber: number }[]) {
  await queueSettled();
  const entryIds = cars.map((c) => c.id);
  const list = entryIds.map(() => "?").join(",");
  const [records] = await db<{ n: number }>(
    `select count(*) as n from records where id in (${made.map(() => "?").join(",")})`,
    made,
  );
  const verdictRows = await db<{ entry_id: string; status: string }>(
    `select entry_id, status from verdicts where entry_id in (${list})`,
    entryIds,
  );
  const mailJobs = await db<{ n: number }>(
    `select count(*) as n from jobs where kind = 'send-mail' and status = 'done'
       and (${entryIds.map(() => "json_value(payload, '$.text') like ?").join(" or ")})`,
    entryIds.map((id) => `%/entries/${id}%`),
  );
  const mailLog = await db<{ n: number }>(
    `select count(*) as n from mail_log where status = 'sent' and job_id in
       (select id from jobs where kind = 'send-mail'
         and (${entryIds.map(() => "json_value(payload, '$.text') like ?").join(" or ")}))`,
    entryIds.map((id) => `%/entries/${id}%`),
  );
  const failed = await db<{ n: number }>("select count(*) as n from jobs where status = 'failed'");
  const messages = (await listMail(stack.mailboxUrl, 0)).filter((m) =>
    cars.some((c) => m.subject.startsWith(`Car ${c.carNumber}:`)),
  );
  return {
    records: Number(records?.n),
    verdictRows: verdictRows.length,
    held: verdictRows.filter((v) => v.status === "held").length,
    mailJobs: Number(mailJobs[0]?.n),
    mailLogSent: Number(mailLog[0]?.n),
    messages: messages.length,
    distinctMessageIds: new Set(
      messages.map((m: MailboxMessage & { messageId?: string }) => m.messageId),
    ).size,
    failedJobs: Number(failed[0]?.n),
  };
}

/** Cars of their own for the bulk cases (copies of a demo entry; readings only, no e-mail counted). */
async function scratchCars(n: number) {
  const made = await makeScratchEntries(stack.databaseUrl, eventId, n);
  return made.map((id) => ({ id, carNumber: -1 }));
}

const recipients = (cars: { recipients: number }[]) => cars.reduce((n, c) => n + c.recipients, 0);

/**
 * What a case that holds each of `cars` once must end with: one verdict row each, held, and one
 * e-mail per person to tell — queued, logged, received, each its own message — nothing given up.
 */
const heldAndMailedOnce = (cars: { recipients: number }[]) => ({
  verdictRows: cars.length,
  held: cars.length,
  mailJobs: recipients(cars),
  mailLogSent: recipients(cars),
  messages: recipients(cars),
  distinctMessageIds: recipients(cars),
  failedJobs: 0,
});

/** The phone's outbox, online through `session` (relative URLs, its cookies). */
const through =
  (session: HttpSession): typeof fetch =>
  (input, init) =>
    session.fetch(String(input), init);
const offline: typeof fetch = async () => {
  throw new TypeError("Failed to fetch");
};

/** Drain like the phone does when it has signal, until nothing is left to send (bounded). */
async function drainUntilEmpty(session: HttpSession) {
  for (let round = 0; round < 40; round += 1) {
    await resetOutboxBackoff({ now: Date.now(), eventId });
    await drainOutbox({ now: () => Date.now(), fetchImpl: through(session) });
    const left = (await listLocalRecords(eventId)).filter(
      (r) => r.state === "queued" || r.state === "sending",
    );
    if (left.length === 0) return;
    await new Promise((r) => setTimeout(r, 250));
  }
  throw new Error("the outbox did not empty in 40 rounds");
}

async function phoneStates() {
  const states = new Map<string, number>();
  for (const r of await listLocalRecords(eventId))
    states.set(r.state, (states.get(r.state) ?? 0) + 1);
  return Object.fromEntries(states);
}

async function queueOnPhone(records: TechRecord[]) {
  for (const record of records) await addLocalRecord({ eventId, record, now: Date.now() });
}

beforeAll(async () => {
  stack = await startFaultStack();
  await Promise.all([stack.startApp(), stack.startWorker()]);
  const [event] = await db<{ id: string }>("select id from events order by event_date limit 1");
  eventId = event?.id ?? "";
  const user = async (email: string) =>
    (await db<{ id: string }>("select id from users where email = ?", [email]))[0]?.id ?? "";
  ids = {
    chief: await user(demo.chief),
    scrutineer: await user(demo.scrutineer),
    scrutineer2: await user(demo.scrutineer2),
  };
  chief = new HttpSession(stack.appUrl);
  scrutineer = new HttpSession(stack.appUrl);
  scrutineer2 = new HttpSession(stack.appUrl);
  await chief.signInWithPassword(demo.chief, demo.password);
  await scrutineer.signInWithPassword(demo.scrutineer, demo.password);
  await scrutineer2.signInWithPassword(demo.scrutineer2, demo.password);
  freeCars = (
    await db<{ id: string; car_number: number; recipients: number }>(
      `select e.id, e.car_number,
              (d.email is not null) + (c.email is not null) as recipients
         from entries e join users d on d.id = e.driver_id left join users c on c.id = e.co_driver_id
         left join verdicts v on v.entry_id = e.id
        where e.event_id = ? and (v.status is null or v.status <> 'held')
        order by e.car_number`,
      [eventId],
    )
  ).map((r) => ({
    id: r.id,
    carNumber: r.car_number,
    recipients: Number(r.recipients),
  }));
}, 180_000);

afterAll(async () => {
  await stack?.stop();
}, 60_000);

beforeEach(async () => {
  made = [];
  await clear(idbStores().records);
});

describe("sync under faults: nothing lost, nothing twice", () => {
  it("the same batch replayed three times: stored once, one verdict change, one e-mail each", async () => {
    const cars = takeCars(2);
    const batch = [
      ...cars.map((c) => hold(c.id)),
      ...Array.from({ length: 10 }, (_, n) =>
        reading(cars[0]?.id ?? "", ids.chief, "chief-phone", n),
      ),
    ];
    const statuses: string[][] = [];
    for (let replay = 0; replay < 3; replay += 1) {
      const response = await postSync(chief, eventId, "chief-phone", batch);
      expect(response.status).toBe(200);
      const body = (await response.json()) as { results: { status: string }[] };
      statuses.push([...new Set(body.results.map((r) => r.status))]);
    }
    expect(statuses).toEqual([["stored"], ["duplicate"], ["duplicate"]]);
    // The same batch twice at the same moment (a retry while the first is still running): both
    // answered, nothing stored twice.
    const twice = await Promise.all([
      postSync(chief, eventId, "chief-phone", batch),
      postSync(chief, eventId, "chief-phone", batch),
    ]);
    expect(twice.map((r) => r.status)).toEqual([200, 200]);
    // An id already used, with other content: refused, and the stored record is unchanged.
    const [first] = batch;
    if (!first) throw new Error("no record");
    const forged = { ...first, payload: { ...(first.payload as object), reason: "changed later" } };
    const refused = (await (await postSync(chief, eventId, "chief-phone", [forged])).json()) as {
      results: { status: string; reason?: string }[];
    };
    expect(refused.results[0]).toMatchObject({
      status: "refused",
      reason: "This record id was already used for a different record.",
    });
    expect(await countFor(cars)).toMatchObject({ records: 12, ...heldAndMailedOnce(cars) });
  });

  it("two phones on one car at once: both stored, one verdict row, one e-mail per person", async () => {
    const [car] = takeCars(1);
    if (!car) throw new Error("no car");
    const a = Array.from({ length: 25 }, (_, n) => reading(car.id, ids.scrutineer, "phone-a", n));
    const b = Array.from({ length: 25 }, (_, n) => reading(car.id, ids.scrutineer2, "phone-b", n));
    const answers = await Promise.all([
      postSync(scrutineer, eventId, "phone-a", a),
      postSync(scrutineer2, eventId, "phone-b", b),
      postSync(chief, eventId, "chief-phone", [hold(car.id)]),
    ]);
    expect(answers.map((r) => r.status)).toEqual([200, 200, 200]);
    expect(await countFor([car])).toMatchObject({ records: 51, ...heldAndMailedOnce([car]) });
  });

  it("40 phones at once, 50 records each: no errors, every record stored once", async () => {
    const cars = await scratchCars(8);
    const phones = Array.from({ length: 40 }, (_, p) => {
      const car = cars[p % cars.length];
      const session = p % 2 === 0 ? scrutineer : scrutineer2;
      const official = p % 2 === 0 ? ids.scrutineer : ids.scrutineer2;
      return {
        session,
        deviceId: `phone-${p}`,
        records: Array.from({ length: 50 }, (_, n) =>
          reading(car?.id ?? "", official, `phone-${p}`, n),
        ),
      };
    });
    const responses = await Promise.all(
      phones.map((p) => postSync(p.session, eventId, p.deviceId, p.records)),
    );
    const bodies = (await Promise.all(responses.map((r) => r.json()))) as {
      results: { status: string }[];
    }[];
    expect(responses.filter((r) => r.status !== 200).map((r) => r.status)).toEqual([]);
    expect(bodies.flatMap((b) => b.results).filter((r) => r.status !== "stored")).toEqual([]);
    const counted = await countFor(cars);
    expect(counted.records).toBe(2000);
    expect(counted.verdictRows).toBe(8);
    // Whatever the readings did to the verdicts, no e-mail went twice.
    expect(counted.messages).toBe(counted.mailJobs);
    expect(counted.distinctMessageIds).toBe(counted.messages);
    expect(counted.failedJobs).toBe(0);
  });

  it("500 records queued offline, then sent when the signal comes back", async () => {
    const cars = await scratchCars(10);
    await queueOnPhone(
      Array.from({ length: 500 }, (_, n) =>
        reading(cars[n % 10]?.id ?? "", ids.scrutineer, "phone-offline", n),
      ),
    );
    const away = await drainOutbox({ now: () => Date.now(), fetchImpl: offline });
    expect(away).toMatchObject({ sent: 0, waiting: 500 });
    expect(await phoneStates()).toEqual({ queued: 500 });
    await drainUntilEmpty(scrutineer);
    expect(await phoneStates()).toEqual({ sent: 500 });
    expect(await countFor(cars)).toMatchObject({ records: 500, verdictRows: 10, failedJobs: 0 });
  });

  it("the app server killed after storing a batch, before answering: the phone sends again, nothing twice", async () => {
    const cars = takeCars(2);
    await queueOnPhone([
      ...cars.map((c) => hold(c.id)),
      ...Array.from({ length: 48 }, (_, n) =>
        reading(cars[1]?.id ?? "", ids.chief, "chief-phone", n),
      ),
    ]);
    await stack.app()?.stop("SIGKILL");
    const dying = await stack.startApp({ PLUMBLINE_FAULTS: "sync:stored" });
    const cut = await drainOutbox({ now: () => Date.now(), fetchImpl: through(chief) });
    expect(cut).toMatchObject({ sent: 0, waiting: 50 });
    await expect(fetch(`${stack.appUrl}/api/health`)).rejects.toThrow(); // it is gone
    await dying.stop("SIGKILL");
    // The batch was committed before the server died: stored, and its verdicts on their way.
    const [stored] = await db<{ n: number }>(
      `select count(*) as n from records where id in (${made.map(() => "?").join(",")})`,
      made,
    );
    expect(Number(stored?.n)).toBe(50);
    await stack.startApp();
    await drainUntilEmpty(chief);
    expect(await phoneStates()).toEqual({ duplicate: 50 });
    expect(await countFor(cars)).toMatchObject({ records: 50, ...heldAndMailedOnce(cars) });
  });

  it("MariaDB restarted in the middle of a sync: the phone waits and sends again, nothing lost", async () => {
    const cars = takeCars(2);
    await queueOnPhone([
      ...cars.map((c) => hold(c.id)),
      ...Array.from({ length: 198 }, (_, n) =>
        reading(cars[n % 2]?.id ?? "", ids.chief, "chief-phone", n),
      ),
    ]);
    let requests = 0;
    const statuses: number[] = [];
    const stopsOnSecondBatch: typeof fetch = async (input, init) => {
      requests += 1;
      if (requests === 2) await stack.stopDatabase();
      const response = await chief.fetch(String(input), init);
      statuses.push(response.status);
      return response;
    };
    const during = await drainOutbox({ now: () => Date.now(), fetchImpl: stopsOnSecondBatch });
    expect(during.sent).toBe(50); // the first batch went; the second met the stopped database
    expect(during.waiting).toBe(150);
    // The database away is the server's passing trouble, said so: 503 with Retry-After, not 500.
    expect(statuses).toEqual([200, 503]);
    await stack.startDatabase();
    await drainUntilEmpty(chief);
    expect(await phoneStates()).toEqual({ sent: 200 });
    expect(await countFor(cars)).toMatchObject({ records: 200, ...heldAndMailedOnce(cars) });
  });

  it("the worker killed after re-deriving verdicts, before marking the job done: run again, nothing twice", async () => {
    const cars = takeCars(2);
    await stack.worker()?.stop();
    const dying = await stack.startWorker({ PLUMBLINE_FAULTS: "worker:recomputed" });
    const response = await postSync(
      chief,
      eventId,
      "chief-phone",
      cars.map((c) => hold(c.id)),
    );
    expect(response.status).toBe(200);
    expect(["SIGKILL", 137]).toContain(await dying.exited); // killed (137 = 128 + 9, through tsx)
    // Its work is committed (verdicts saved, e-mails queued) and its job still shows running.
    const [running] = await db<{ n: number }>(
      "select count(*) as n from jobs where kind = 'recompute-verdicts' and status = 'running'",
    );
    expect(Number(running?.n)).toBe(1);
    await stack.startWorker();
    expect(await countFor(cars)).toMatchObject(heldAndMailedOnce(cars));
    const [runs] = await db<{ attempts: number }>(
      "select max(attempts) as attempts from jobs where kind = 'recompute-verdicts'",
    );
    expect(Number(runs?.attempts)).toBeGreaterThanOrEqual(2); // it did run again
  });

  it("the worker killed after sending an e-mail, before marking it done: the e-mail is not sent again", async () => {
    // A car with one person to tell: the worker dies after that one e-mail, none in flight beside it.
    const car = freeCars.find((c) => c.recipients === 1);
    if (!car) throw new Error("no car with a single driver to tell");
    freeCars = freeCars.filter((c) => c !== car);
    await stack.worker()?.stop();
    const dying = await stack.startWorker({ PLUMBLINE_FAULTS: "worker:mail-sent" });
    const response = await postSync(chief, eventId, "chief-phone", [hold(car.id)]);
    expect(response.status).toBe(200);
    expect(["SIGKILL", 137]).toContain(await dying.exited); // killed (137 = 128 + 9, through tsx)
    await stack.startWorker();
    expect(await countFor([car])).toMatchObject(heldAndMailedOnce([car]));
  });

  it("signed out while offline: records wait for the sign-in, then go, nothing lost", async () => {
    const cars = takeCars(1);
    await queueOnPhone(
      Array.from({ length: 30 }, (_, n) =>
        reading(cars[0]?.id ?? "", ids.scrutineer, "phone-x", n),
      ),
    );
    await drainOutbox({ now: () => Date.now(), fetchImpl: offline });
    const expired = new HttpSession(stack.appUrl); // the session cookie has gone
    await resetOutboxBackoff({ now: Date.now(), eventId }); // "Send now", back in signal
    const refused = await drainOutbox({ now: () => Date.now(), fetchImpl: through(expired) });
    expect(refused.signedOut).toBe(true);
    expect(await phoneStates()).toEqual({ "needs-sign-in": 30 });
    await expired.signInWithPassword(demo.scrutineer, demo.password);
    await requeueSignedOutRecords(eventId);
    await drainUntilEmpty(expired);
    expect(await phoneStates()).toEqual({ sent: 30 });
    expect(await countFor(cars)).toMatchObject({ records: 30, verdictRows: 1, failedJobs: 0 });
  });
});
