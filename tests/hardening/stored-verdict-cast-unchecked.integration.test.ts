import { afterAll, beforeAll, describe, expect, inject, it } from "vitest";
import { demo } from "../support/demo-accounts";
import { HttpSession } from "../support/http-session";
import { queryTestDb } from "../support/query-test-db";
import { techFixtures } from "../support/tech-fixtures";

// Defect: a verdict's stored JSON was cast to `Verdict` unread (lib/entries/load-entry-result.ts,
// db/queries/list-event-verdicts.ts). A row that does not match the verdict schema (written by
// another version, or damaged) made the entry page, the event pack and the chief's page answer
// 500, or showed a decision by nobody. Such a row now counts as no verdict: Waiting.

const appUrl = inject("appUrl");
const databaseUrl = inject("databaseUrl");

type Row = { id: string; car_number: number; result: string };

let fx: Awaited<ReturnType<typeof techFixtures>>;
let chief: HttpSession;
/** Two cleared cars whose stored JSON this test damages, and their JSON as it was. */
let damaged: Row[] = [];

const BROKEN = [
  // Flags that are not a list, and no rule results at all.
  { flags: 7, status: "cleared" },
  // Looks like a verdict with a standing decision, but the decision names nobody.
  { flags: ["overridden"], override: "the chief" },
];

beforeAll(async () => {
  fx = await techFixtures(databaseUrl);
  chief = new HttpSession(appUrl);
  await chief.signInWithPassword(demo.chief, demo.password);
  // Cars no other test chooses: cleared with nothing odd, the highest car numbers first.
  damaged = await queryTestDb<Row>(
    databaseUrl,
    `select e.id, e.car_number, cast(v.result as char) as result from entries e
       join verdicts v on v.entry_id = e.id
      where e.event_id = ? and v.status = 'cleared' and v.needs_chief = 0
        and json_length(json_extract(v.result, '$.flags')) = 0
      order by e.car_number desc limit 2`,
    [fx.eventId],
  );
  expect(damaged).toHaveLength(2);
  for (const [i, row] of damaged.entries()) {
    await queryTestDb(databaseUrl, "update verdicts set result = ? where entry_id = ?", [
      JSON.stringify(BROKEN[i]),
      row.id,
    ]);
  }
});

afterAll(async () => {
  for (const row of damaged) {
    await queryTestDb(databaseUrl, "update verdicts set result = ? where entry_id = ?", [
      row.result,
      row.id,
    ]);
  }
});

describe("a stored verdict that does not match the verdict schema", () => {
  it("is no verdict on the entry's result: Waiting, not a 500", async () => {
    for (const row of damaged) {
      const response = await chief.fetch(`/api/entries/${row.id}/verdict`);
      expect(response.status).toBe(200);
      const result = (await response.json()) as {
        status: string;
        lines: unknown[];
        decidedBy: string | null;
      };
      expect(result.status).toBe("waiting");
      expect(result.lines).toEqual([]);
      expect(result.decidedBy).toBeNull();

      const page = await chief.fetch(`/entries/${row.id}`);
      expect(page.status).toBe(200);
    }
  });

  it("is left out of the event pack, which still loads for the phones", async () => {
    const response = await chief.fetch(`/api/events/${fx.eventId}/pack`);
    expect(response.status).toBe(200);
    const pack = (await response.json()) as { verdicts: { entryId: string }[] };
    const ids = pack.verdicts.map((v) => v.entryId);
    for (const row of damaged) expect(ids).not.toContain(row.id);
    expect(ids.length).toBeGreaterThan(0);
  });

  it("puts the car neither in the chief's queue nor among the decided, and the page loads", async () => {
    const response = await chief.fetch(`/tech/${fx.eventId}/chief`);
    expect(response.status).toBe(200);
    const html = await response.text();
    for (const row of damaged) expect(html).not.toContain(`data-car-number="${row.car_number}"`);
    expect(html).not.toContain("an official no longer listed");
  });
});
