// The CSV exports of the tech results and of the chief scrutineer's report, downloaded as the
// officials would and read back with csv-parse (npm), compared with the database read by SQL.
import { randomUUID } from "node:crypto";
import { parse } from "csv-parse/sync";
import { afterAll, beforeAll, describe, expect, inject, it } from "vitest";
import { buildSchedule } from "@/lib/paddock/build-schedule";
import { type RunSheet, runSheetSchema } from "@/lib/paddock/run-sheet-schema";
import { demo } from "../support/demo-accounts";
import { HttpSession } from "../support/http-session";
import { queryTestDb } from "../support/query-test-db";
import { makeScratchEntries, removeScratchEntries } from "../support/scratch-entries";

const appUrl = inject("appUrl");
const databaseUrl = inject("databaseUrl");

type Row = Record<string, string>;
type Car = {
  car_number: number;
  status: string | null;
  final_class: string | null;
  records: number;
};
let eventId = "";
let timeZone = "";
let cars: Car[] = [];
let classNames: Record<string, string> = {};
let scratch: string[] = [];
const accentedId = randomUUID();
// Test value: a name with letters outside ASCII, to see UTF-8 come through whole.
const ACCENTED = "Zoë Ångström-Nuñez";

const labels: Record<string, string> = {
  waiting: "Waiting",
  cleared: "Cleared",
  "moved-up": "Moved up",
  "re-measure": "Re-measure",
  held: "Held",
};

async function signedIn(email: string): Promise<HttpSession> {
  const session = new HttpSession(appUrl);
  await session.signInWithPassword(email, demo.password);
  return session;
}

async function download(email: string, what: string) {
  const response = await (await signedIn(email)).fetch(`/api/events/${eventId}/${what}/csv`);
  const bytes = new Uint8Array(await response.arrayBuffer());
  const rows =
    response.status === 200
      ? (parse(Buffer.from(bytes), { bom: true, columns: true }) as Row[])
      : [];
  return { response, bytes, rows };
}

/** The venue's wall-clock time of an instant, worked with Intl here (not the app's formatter). */
function venueTime(instant: Date): string {
  const p = Object.fromEntries(
    new Intl.DateTimeFormat("en-GB", {
      timeZone,
      year: "numeric",
      month: "2-digit",
      day: "2-digit",
      hour: "2-digit",
      minute: "2-digit",
      hourCycle: "h23",
    })
      .formatToParts(instant)
      .map((x) => [x.type, x.value]),
  );
  return `${p.year}-${p.month}-${p.day} ${p.hour}:${p.minute}`;
}

beforeAll(async () => {
  const [event] = await queryTestDb<{ id: string; time_zone: string; body: unknown }>(
    databaseUrl,
    `select e.id, e.time_zone, v.body from events e
       join rule_set_versions v on v.id = e.rule_set_version_id order by e.event_date limit 1`,
  );
  if (!event) throw new Error("no event");
  eventId = event.id;
  timeZone = event.time_zone;
  const body = (typeof event.body === "string" ? JSON.parse(event.body) : event.body) as {
    classes: { id: string; name: string }[];
  };
  classNames = Object.fromEntries(body.classes.map((c) => [c.id, c.name]));
  // One car of this file's own, driven by someone whose name is not ASCII.
  const [hash] = await queryTestDb<{ password_hash: string }>(
    databaseUrl,
    "select password_hash from users where email = ?",
    [demo.entrant],
  );
  await queryTestDb(
    databaseUrl,
    "insert into users (id, name, email, password_hash, created_at) values (?, ?, ?, ?, now())",
    [
      accentedId,
      ACCENTED,
      `exports-${accentedId.slice(0, 8)}@brackenmoor.test`,
      hash?.password_hash,
    ],
  );
  scratch = await makeScratchEntries(databaseUrl, eventId, 1);
  await queryTestDb(
    databaseUrl,
    "update entries set driver_id = ?, co_driver_id = null where id = ?",
    [accentedId, scratch[0]],
  );
  cars = (
    await queryTestDb<Car>(
      databaseUrl,
      `select e.car_number, v.status, v.final_class,
              (select count(*) from records r where r.entry_id = e.id) as records
         from entries e left join verdicts v on v.entry_id = e.id
        where e.event_id = ? and e.status = 'entered' order by e.car_number`,
      [eventId],
    )
  ).map((c) => ({ ...c, records: Number(c.records) }));
});

afterAll(async () => {
  await removeScratchEntries(databaseUrl, scratch);
  await queryTestDb(databaseUrl, "delete from users where id = ?", [accentedId]);
});

describe("GET /api/events/:id/tech-results/csv", () => {
  it("downloads as a UTF-8 CSV attachment named for the event and its time of issue", async () => {
    const { response, bytes } = await download(demo.clerk, "tech-results");
    expect(response.status).toBe(200);
    expect(response.headers.get("content-type")).toBe("text/csv; charset=utf-8; header=present");
    // Source: RFC 6266 §4.1 — disposition type "attachment" with a quoted filename.
    expect(response.headers.get("content-disposition")).toMatch(
      /^attachment; filename="tech-results-[a-z0-9-]+-\d{4}-\d{2}-\d{2}-\d{4}\.csv"$/,
    );
    // Source: Unicode 15 §23.8 / RFC 3629 §6 — the UTF-8 byte order mark is EF BB BF.
    expect([...bytes.slice(0, 3)]).toEqual([0xef, 0xbb, 0xbf]);
    // Source: RFC 3629 §3 — "ë" (U+00EB) is C3 AB in UTF-8.
    expect(Buffer.from(bytes).includes(Buffer.from([0xc3, 0xab]))).toBe(true);
    expect(new TextDecoder("utf-8", { fatal: true }).decode(bytes)).toContain(ACCENTED);
  });

  it("has one line per car entered, each with the state and class the database holds", async () => {
    const { rows } = await download(demo.clerk, "tech-results");
    expect(rows.map((r) => Number(r.Car))).toEqual(cars.map((c) => c.car_number));
    for (const [i, car] of cars.entries()) {
      const row = rows[i] as Row;
      expect(row.State, `car ${car.car_number}`).toBe(labels[car.status ?? "waiting"]);
      const runs = car.status === "cleared" || car.status === "moved-up";
      expect(row["Runs in class"]).toBe(runs ? classNames[car.final_class ?? ""] : "");
      if (car.status === "moved-up") expect(row.Why).toMatch(/^Moves up from /);
    }
    expect(rows.some((r) => r.State === "Moved up")).toBe(true);
    expect(rows.some((r) => r.State === "Held")).toBe(true);
    expect(rows.find((r) => r["Driver(s)"] === ACCENTED)).toBeDefined();
  });

  it("says provisional on every line, issued at the latest verdict in the venue's time", async () => {
    const { rows } = await download(demo.chief, "tech-results");
    const [latest] = await queryTestDb<{ at: Date }>(
      databaseUrl,
      `select max(v.computed_at) as at from verdicts v join entries e on e.id = v.entry_id
        where v.event_id = ? and e.status = 'entered'`,
      [eventId],
    );
    const issued = venueTime(new Date(latest?.at ?? 0)).slice(11);
    for (const r of rows) {
      expect(r.Results).toMatch(new RegExp(`^Provisional, issued ${issued} on `));
      expect(r.Results).toContain(`(${timeZone} time)`);
    }
    expect(Object.keys(rows[0] ?? {})).toContain(`Verdict computed (${timeZone})`);
  });

  it("refuses an event id that is not one (422) and an event the caller does not officiate (403)", async () => {
    const clerk = await signedIn(demo.clerk);
    expect((await clerk.fetch("/api/events/not-an-id/tech-results/csv")).status).toBe(422);
    expect((await clerk.fetch(`/api/events/${randomUUID()}/tech-results/csv`)).status).toBe(403);
  });
});

describe("GET /api/events/:id/chief-report/csv", () => {
  it("lists every car with a record at the tech line and no other, each rejection in words", async () => {
    const { response, rows } = await download(demo.clerk, "chief-report");
    expect(response.status).toBe(200);
    expect(response.headers.get("content-disposition")).toMatch(
      /^attachment; filename="chief-report-[a-z0-9-]+-\d{4}-\d{2}-\d{2}-\d{4}\.csv"$/,
    );
    // Source: Motorsport UK NCR 2026 Ch.5 Part A App.6 Art.3.1 — all cars examined are reported.
    const examined = cars.filter((c) => c.records > 0);
    expect(examined.length).toBeGreaterThan(0);
    expect(rows.map((r) => Number(r.Car))).toEqual(examined.map((c) => c.car_number));
    for (const [i, car] of examined.entries()) {
      const row = rows[i] as Row;
      expect(row.State).toBe(labels[car.status ?? "waiting"]);
      expect(Number(row.Records)).toBe(car.records);
      // A held or moved-up car was refused something: each reason is a line of its own.
      if (car.status === "held" || car.status === "moved-up") {
        expect(row["Reasons for rejection"], `car ${car.car_number}`).not.toBe("");
        for (const line of (row["Reasons for rejection"] ?? "").split("\n")) {
          expect(line).toMatch(/^(.+ class|Event rule|Safety: .+): .+\.$/);
        }
      }
      if (car.status === "cleared") expect(row["Reasons for rejection"]).toBe("");
      expect(row.Report).toMatch(/^Provisional, issued /);
    }
  });

  it("is the chief scrutineer's and the clerk's only", async () => {
    expect((await download(demo.chief, "chief-report")).response.status).toBe(200);
    expect((await download(demo.scrutineer, "chief-report")).response.status).toBe(403);
    expect((await download(demo.registrar, "chief-report")).response.status).toBe(403);
  });
});

describe("GET /api/events/:id/run-sheet/csv", () => {
  const publicationId = randomUUID();
  let body: RunSheet;

  beforeAll(async () => {
    // A run sheet as publishing stores it: two groups of demo cars, the day laid out by
    // buildSchedule; stored as the event's next version and taken out again afterwards.
    const [event] = await queryTestDb<{ event_date: string | Date }>(
      databaseUrl,
      "select event_date from events where id = ?",
      [eventId],
    );
    const eventDate =
      event?.event_date instanceof Date
        ? event.event_date.toISOString().slice(0, 10)
        : String(event?.event_date).slice(0, 10);
    const ready = cars.filter((c) => c.status === "cleared" || c.status === "moved-up").slice(0, 6);
    const entryRows = await queryTestDb<{
      id: string;
      car_number: number;
      name: string;
      driver_id: string;
      car_id: string;
    }>(
      databaseUrl,
      `select e.id, e.car_number, u.name, e.driver_id, e.car_id from entries e join users u on u.id = e.driver_id
        where e.event_id = ? and e.car_number in (${ready.map(() => "?").join(", ")}) order by e.car_number`,
      [eventId, ...ready.map((c) => c.car_number)],
    );
    const drives = entryRows.map((e) => ({
      driveId: `${e.id}:1`,
      entryId: e.id,
      carNumber: e.car_number,
      carKey: e.car_id,
      driverKey: e.driver_id,
      driverName: e.name,
      classId: "c",
      className: "Test class",
      classRank: 0,
      experience: "intermediate" as const,
      lapTimeMs: 100_000,
    }));
    const settings = {
      dayStart: "09:00",
      dayEnd: "17:00",
      sessionMinutes: 20,
      gapMinutes: 10,
      lunch: { start: "12:30", minutes: 45 },
      rounds: 2,
      briefing: { start: "08:15", minutes: 30 },
    };
    const groups = [
      { name: "Group A", driveIds: drives.slice(0, 3).map((d) => d.driveId) },
      { name: "Group B", driveIds: drives.slice(3).map((d) => d.driveId) },
    ];
    const { sessions, blocks } = buildSchedule({ eventDate, timeZone, settings, groupCount: 2 });
    body = runSheetSchema.parse({
      timeZone,
      eventDate,
      drives,
      groups,
      settings,
      sessions,
      blocks,
      explanations: {},
      gaveWay: [],
      cap: { cars: 3, source: "3 cars: a test value" },
    });
    const [clerk] = await queryTestDb<{ id: string }>(
      databaseUrl,
      "select id from users where email = ?",
      [demo.clerk],
    );
    const [last] = await queryTestDb<{ v: number | null }>(
      databaseUrl,
      "select max(version) as v from run_group_publications where event_id = ?",
      [eventId],
    );
    await queryTestDb(
      databaseUrl,
      `insert into run_group_publications (id, event_id, version, body, published_by, published_at)
       values (?, ?, ?, ?, ?, utc_timestamp(3))`,
      [publicationId, eventId, Number(last?.v ?? 0) + 1, JSON.stringify(body), clerk?.id],
    );
  });

  afterAll(async () => {
    await queryTestDb(databaseUrl, "delete from run_group_publications where id = ?", [
      publicationId,
    ]);
  });

  it("downloads the latest run sheet, one line per drive, with each round's local start", async () => {
    const { response, rows, bytes } = await download(demo.registrar, "run-sheet");
    expect(response.status).toBe(200);
    expect(response.headers.get("content-disposition")).toMatch(
      /^attachment; filename="run-sheet-v\d+-[a-z0-9-]+-\d{4}-\d{2}-\d{2}-\d{4}\.csv"$/,
    );
    expect([...bytes.slice(0, 3)]).toEqual([0xef, 0xbb, 0xbf]);
    expect(rows.map((r) => [r.Group, Number(r.Car)])).toEqual(
      body.groups.flatMap((g) =>
        g.driveIds.map((id) => [g.name, body.drives.find((d) => d.driveId === id)?.carNumber]),
      ),
    );
    // Each start as the venue's wall-clock time (worked here with Intl from the stored instant).
    for (const r of rows) {
      const index = r.Group === "Group A" ? 1 : 2;
      const stored = body.sessions.find((s) => s.round === 1 && s.groupIndex === index);
      expect(r["Round 1 start"]?.slice(0, 16).replace("T", " ")).toBe(
        venueTime(new Date(stored?.startsAt ?? 0)),
      );
    }
  });
});
