import { v7 as uuidv7 } from "uuid";
import { beforeAll, describe, expect, inject, it } from "vitest";
import { readSyncAnswer } from "../support/await-verdicts";
import { demo } from "../support/demo-accounts";
import { HttpSession } from "../support/http-session";
import { postSync } from "../support/post-sync";
import { queryTestDb } from "../support/query-test-db";
import { techFixtures } from "../support/tech-fixtures";

const appUrl = inject("appUrl");
const databaseUrl = inject("databaseUrl");

type PackVerdict = {
  entryId: string;
  status: string;
  reason: string;
  flags: string[];
  needsChief: boolean;
  override: { officialId: string; deviceTime: string } | null;
  rejectedOverride: { officialId: string; deviceTime: string; problem: string } | null;
};

let fx: Awaited<ReturnType<typeof techFixtures>>;
let chief: HttpSession;
let chiefId: string;
let chiefName: string;
let timeZone: string;
/** One car for both steps: first a decision that does not fit, then one that does. */
let car: { entryId: string; carNumber: number };

// 09:42 UTC on 16 May 2026 is 10:42 in London (BST, UTC+1). Source: IANA tz database.
const DECIDED_AT = new Date("2026-05-16T09:42:30.000Z");
const DECIDED_WORDS = "at 10:42 on Sat 16 May";

function overrideRecord(entryId: string, payload: Record<string, unknown>, at = DECIDED_AT) {
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

async function sync(records: unknown[]) {
  const response = await postSync(chief, fx.eventId, "chief-phone", records);
  expect(response.status).toBe(200);
  return (await readSyncAnswer(chief, fx.eventId, response)) as {
    results: { status: string }[];
    verdicts: PackVerdict[];
  };
}

/** A waiting car entered above the lowest class, and not one the other tests use. */
async function harrierOrAboveCar(): Promise<{ entryId: string; carNumber: number }> {
  const rows = await queryTestDb<{ id: string; car_number: number }>(
    databaseUrl,
    `select e.id, e.car_number from entries e left join verdicts v on v.entry_id = e.id
      where e.event_id = ? and e.declared_class in ('harrier', 'peregrine') and e.car_number <> 7
        and (v.status is null or v.status = 'waiting') and e.status = 'entered'
      order by e.car_number`,
    [fx.eventId],
  );
  const row = rows.at(-2);
  if (!row) throw new Error("no waiting Harrier or Peregrine car in the demo");
  return { entryId: row.id, carNumber: row.car_number };
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
  timeZone = event?.time_zone ?? "";
  car = await harrierOrAboveCar();
});

describe("the chief scrutineer's decisions, as the server keeps and shows them", () => {
  it("flags an override that moves a car 'up' into a lower class, says why, and queues the car", async () => {
    expect(timeZone).toBe("Europe/London"); // the expected times below are London's
    const { entryId, carNumber } = car;
    const answer = await sync([
      overrideRecord(entryId, { status: "moved-up", classId: "kestrel", reason: "Entrant asked" }),
    ]);
    expect(answer.results[0]?.status).toBe("stored");
    const verdict = answer.verdicts.find((v) => v.entryId === entryId);
    expect(verdict?.flags).toContain("override-invalid");
    expect(verdict?.needsChief).toBe(true);
    expect(verdict?.override).toBeNull();
    expect(verdict?.rejectedOverride?.problem).toMatch(
      /^Kestrel is below (Harrier|Peregrine), the class this car was entered in/,
    );

    // The chief's queue: the card links to the car card and says plainly why it is there.
    const html = await (await chief.fetch(`/tech/${fx.eventId}/chief`)).text();
    const row = html.slice(html.indexOf(`data-car-number="${carNumber}"`)).slice(0, 4000);
    expect(row).toContain(`href="/tech/${fx.eventId}?entry=${entryId}"`);
    expect(row).toContain(`Override not applied — saved by ${chiefName} ${DECIDED_WORDS}`);
    expect(row).not.toContain(chiefId);
  });

  it("shows who decided and when for a later override that fits: pack, chief page and entry page", async () => {
    const { entryId, carNumber } = car;
    const [entry] = await queryTestDb<{ declared_class: string }>(
      databaseUrl,
      "select declared_class from entries where id = ?",
      [entryId],
    );
    const answer = await sync([
      overrideRecord(
        entryId,
        { status: "cleared", classId: entry?.declared_class, reason: "Wing re-measured by me" },
        new Date(DECIDED_AT.getTime() + 1000),
      ),
    ]);
    const verdict = answer.verdicts.find((v) => v.entryId === entryId);
    expect(verdict?.status).toBe("cleared");
    expect(verdict?.override?.officialId).toBe(chiefId);
    expect(verdict?.reason).not.toContain(chiefId);

    const pack = (await (await chief.fetch(`/api/events/${fx.eventId}/pack`)).json()) as {
      verdicts: PackVerdict[];
      officials: { userId: string; name: string }[];
    };
    const packed = pack.verdicts.find((v) => v.entryId === entryId);
    expect(packed?.override).toEqual({
      officialId: chiefId,
      deviceTime: "2026-05-16T09:42:31.000Z",
    });
    expect(pack.officials.find((o) => o.userId === chiefId)?.name).toBe(chiefName);

    const html = await (await chief.fetch(`/tech/${fx.eventId}/chief`)).text();
    const decided = html.slice(html.indexOf('data-testid="chief-decided"'));
    const row = decided.slice(decided.indexOf(`data-car-number="${carNumber}"`)).slice(0, 4000);
    expect(row).toContain(`Decided by <!-- -->${chiefName} ${DECIDED_WORDS}`);

    const result = (await (await chief.fetch(`/api/entries/${entryId}/verdict`)).json()) as {
      reason: string;
      decidedBy: string | null;
    };
    expect(result.reason).toMatch(/^Chief scrutineer's decision: cleared in/);
    expect(result.decidedBy).toBe(`${chiefName} ${DECIDED_WORDS}`);
  });
});
