import { v7 as uuidv7 } from "uuid";
import { beforeAll, describe, expect, inject, it } from "vitest";
import { readSyncAnswer } from "../support/await-verdicts";
import { demo } from "../support/demo-accounts";
import { HttpSession } from "../support/http-session";
import { postSync } from "../support/post-sync";
import { queryTestDb } from "../support/query-test-db";
import { techFixtures } from "../support/tech-fixtures";

// Defect: after the chief scrutineer's override to Cleared, the car stayed under "cars wait for
// you" with "Too close to call", and "Decided by the chief scrutineer" still said "No overrides
// yet", reload after reload. A decision that stands settles the car; one that does not fit keeps
// it waiting, with why.

const appUrl = inject("appUrl");
const databaseUrl = inject("databaseUrl");

type PackVerdict = {
  entryId: string;
  status: string;
  flags: string[];
  needsChief: boolean;
  override: { officialId: string; deviceTime: string } | null;
};
type Car = { entryId: string; carNumber: number; declaredClass: string };

let fx: Awaited<ReturnType<typeof techFixtures>>;
let chief: HttpSession;
let chiefId = "";
let chiefName = "";

// 09:42 UTC on 16 May 2026 is 10:42 in London (BST, UTC+1). Source: IANA tz database.
const DECIDED_AT = Date.parse("2026-05-16T09:42:30.000Z");
const DECIDED_WORDS = "at 10:42 on Sat 16 May";

/** The demo car whose stored verdict has `flag` (and, when `without` is given, not that one). */
async function carFlagged(flag: string, without?: string): Promise<Car> {
  const rows = await queryTestDb<{ id: string; car_number: number; declared_class: string }>(
    databaseUrl,
    `select e.id, e.car_number, e.declared_class from entries e
       join verdicts v on v.entry_id = e.id
      where e.event_id = ? and e.status = 'entered'
        and json_contains(json_extract(v.result, '$.flags'), json_quote(?))
        and (? is null or not json_contains(json_extract(v.result, '$.flags'), json_quote(?)))
      order by e.car_number`,
    [fx.eventId, flag, without ?? null, without ?? ""],
  );
  const row = rows[0];
  if (!row) throw new Error(`the demo has no car flagged ${flag}`);
  return { entryId: row.id, carNumber: row.car_number, declaredClass: row.declared_class };
}

function override(entryId: string, payload: Record<string, unknown>, offsetMs: number) {
  const at = new Date(DECIDED_AT + offsetMs);
  return {
    id: uuidv7({ msecs: at.getTime() }),
    kind: "override",
    entryId,
    officialId: chiefId,
    deviceId: "chief-phone",
    deviceTime: at.toISOString(),
    payload,
  };
}

async function sync(record: unknown): Promise<PackVerdict | undefined> {
  const response = await postSync(chief, fx.eventId, "chief-phone", [record]);
  expect(response.status).toBe(200);
  const body = (await readSyncAnswer(chief, fx.eventId, response)) as {
    results: { status: string }[];
    verdicts: PackVerdict[];
  };
  expect(body.results[0]?.status).toBe("stored");
  return body.verdicts[0];
}

/** The chief's page as a fresh load: the car's row in "cars wait for you" and in "Decided". */
async function chiefPage(carNumber: number) {
  const response = await chief.fetch(`/tech/${fx.eventId}/chief`);
  expect(response.status).toBe(200);
  const html = await response.text();
  const split = html.indexOf('id="chief-decided-title"');
  expect(split).toBeGreaterThan(0);
  const rowIn = (part: string) => {
    const at = part.indexOf(`data-car-number="${carNumber}"`);
    if (at < 0) return null;
    // Each row ends with its link's last line.
    const end = part.indexOf("Open the car card", at);
    return part.slice(at, end < 0 ? undefined : end).replace(/<!-- -->/g, "");
  };
  return { waiting: rowIn(html.slice(0, split)), decided: rowIn(html.slice(split)), html };
}

async function storedNeedsChief(entryId: string): Promise<number | undefined> {
  const [row] = await queryTestDb<{ needs_chief: number }>(
    databaseUrl,
    "select needs_chief from verdicts where entry_id = ?",
    [entryId],
  );
  return row?.needs_chief;
}

async function packVerdict(entryId: string): Promise<PackVerdict | undefined> {
  const pack = (await (await chief.fetch(`/api/events/${fx.eventId}/pack`)).json()) as {
    verdicts: PackVerdict[];
  };
  return pack.verdicts.find((v) => v.entryId === entryId);
}

beforeAll(async () => {
  fx = await techFixtures(databaseUrl);
  chief = new HttpSession(appUrl);
  await chief.signInWithPassword(demo.chief, demo.password);
  chiefId = await fx.userId(demo.chief);
  const [user] = await queryTestDb<{ name: string }>(
    databaseUrl,
    "select name from users where id = ?",
    [chiefId],
  );
  chiefName = user?.name ?? "";
  const [event] = await queryTestDb<{ time_zone: string }>(
    databaseUrl,
    "select time_zone from events where id = ?",
    [fx.eventId],
  );
  expect(event?.time_zone).toBe("Europe/London"); // the expected times above are London's
});

describe("the chief's queue after a decision", () => {
  it("moves a too-close-to-call car cleared by the chief from 'cars wait for you' to 'Decided', with who and when", async () => {
    const car = await carFlagged("inconclusive", "disagreement");
    const before = await chiefPage(car.carNumber);
    expect(before.waiting).toContain("Too close to call");

    const verdict = await sync(
      override(
        car.entryId,
        { status: "cleared", classId: car.declaredClass, reason: "Re-measured with the gauge" },
        0,
      ),
    );
    expect(verdict?.status).toBe("cleared");
    expect(verdict?.override?.officialId).toBe(chiefId);
    expect(verdict?.needsChief).toBe(false);
    expect(await storedNeedsChief(car.entryId)).toBe(0);
    expect((await packVerdict(car.entryId))?.needsChief).toBe(false);

    // Twice: the page is read from the database on every load, so a reload shows the same.
    for (let load = 0; load < 2; load += 1) {
      const page = await chiefPage(car.carNumber);
      expect(page.waiting).toBeNull();
      expect(page.decided).toContain(`Decided by ${chiefName} ${DECIDED_WORDS}`);
      expect(page.decided).toContain("Chief scrutineer&#x27;s decision: cleared in");
      expect(page.decided).not.toContain("Too close to call");
      expect(page.html).not.toContain("No overrides yet.");
    }
  });

  it("keeps a car whose readings disagree waiting while its override does not fit, then settles it with one that does", async () => {
    const car = await carFlagged("disagreement");
    expect((await chiefPage(car.carNumber)).waiting).toContain("Readings disagree");

    // "Cleared" must name the declared class (override-target-problem.ts): another class does not fit.
    const other = car.declaredClass === "kestrel" ? "merlin" : "kestrel";
    const rejected = await sync(
      override(car.entryId, { status: "cleared", classId: other, reason: "Entrant asked" }, 1000),
    );
    expect(rejected?.flags).toContain("override-invalid");
    expect(rejected?.needsChief).toBe(true);
    const waiting = await chiefPage(car.carNumber);
    expect(waiting.waiting).toContain(`Override not applied — saved by ${chiefName} at 10:42`);
    expect(waiting.waiting).toContain("Readings disagree");
    expect(waiting.decided).toBeNull();

    const held = await sync(
      override(car.entryId, { status: "held", classId: null, reason: "Wing mount cracked" }, 2000),
    );
    expect(held?.status).toBe("held");
    expect(held?.needsChief).toBe(false);
    expect(await storedNeedsChief(car.entryId)).toBe(0);
    const decided = await chiefPage(car.carNumber);
    expect(decided.waiting).toBeNull();
    expect(decided.decided).toContain(`Decided by ${chiefName} ${DECIDED_WORDS}`);
    expect(decided.decided).not.toContain("Readings disagree");
  });
});
