// Declarations: the server action parses them again with the engine's schema (an impossible dyno
// sheet is refused with a field message and nothing is saved); valid ones are saved and the
// verdict is recomputed from them by the worker.
import { afterAll, beforeAll, describe, expect, inject, it } from "vitest";
import { actionState } from "../support/action-state";
import { callServerAction } from "../support/call-server-action";
import { queryTestDb } from "../support/query-test-db";
import { removeScratchEntries } from "../support/scratch-entries";
import { waitForQueueIdle } from "../support/wait-for-queue-idle";
import { demoEvent, makeEntry, makePerson, removePeople, signedIn } from "./waiver-fixtures";

const appUrl = inject("appUrl");
const databaseUrl = inject("databaseUrl");
const SAVE = "app/(entrant)/entries/[entryId]/declare/actions.ts#saveDeclarationsAction";
type State = { status: string; message?: string; fields?: Record<string, string[]> };

const entries: string[] = [];
const people: string[] = [];
let entryId = "";
let driverEmail = "";

beforeAll(async () => {
  const event = await demoEvent(databaseUrl);
  const driver = await makePerson(databaseUrl, { name: "Tamsin Roper" });
  people.push(driver.id);
  driverEmail = driver.email;
  entryId = await makeEntry(databaseUrl, event.id, { driverId: driver.id });
  entries.push(entryId);
});
afterAll(async () => {
  await removeScratchEntries(databaseUrl, entries);
  await removePeople(databaseUrl, people);
});

const sheet = (pressure: { value: number; unit: string }) => ({
  aero: { wing: true, splitter: false, diffuser: false },
  dynoSheet: {
    power: { value: 150, unit: "hp" },
    measuredAt: "wheel",
    correction: "sae-j1349",
    ambient: { pressure, temperature: { value: 20, unit: "C" } },
    date: "2026-04-01",
  },
  tyres: { kind: "graded", treadwear: 140 },
  modificationPoints: 4,
  driverWeightKg: 82,
  ballastKg: 0,
  engine: null,
});

async function save(declarations: unknown, email = driverEmail) {
  const answer = await callServerAction(await signedIn(appUrl, email), {
    action: SAVE,
    page: `/entries/${entryId}/declare`,
    fields: { entryId, declarations: JSON.stringify(declarations) },
    state: { status: "idle" },
  });
  expect(answer.status).toBe(200);
  return actionState<State>(answer.text);
}

const stored = async () =>
  (
    await queryTestDb<{ declarations: unknown }>(
      databaseUrl,
      "select declarations from entries where id = ?",
      [entryId],
    )
  )[0]?.declarations;

describe("declarations", () => {
  it("refuses a dyno sheet whose air pressure cannot be true, names the field, saves nothing", async () => {
    // Source: WMO World Weather & Climate Extremes Archive — highest sea-level pressure on record
    // 1,083.8 hPa; 2,000 hPa cannot be a dyno cell's air.
    const before = JSON.stringify(await stored());
    const jobsBefore = await queryTestDb<{ n: number }>(
      databaseUrl,
      "select count(*) as n from jobs where kind = 'recompute-verdicts' and payload like ?",
      [`%${entryId}%`],
    );
    const state = await save(sheet({ value: 2000, unit: "hPa" }));
    expect(state.status).toBe("error");
    expect(state.fields?.["declarations.dynoSheet.ambient"]?.[0]).toMatch(
      /cannot be true: its air pressure 2,000(\.0)? hPa/,
    );
    expect(JSON.stringify(await stored())).toBe(before);
    const jobsAfter = await queryTestDb<{ n: number }>(
      databaseUrl,
      "select count(*) as n from jobs where kind = 'recompute-verdicts' and payload like ?",
      [`%${entryId}%`],
    );
    expect(jobsAfter[0]?.n).toBe(jobsBefore[0]?.n);
  });

  it("saves valid declarations and the verdict is recomputed to quote them", async () => {
    // Source: ISO 2533:1975 — standard sea-level pressure 1,013.25 hPa, a plausible cell.
    const saved = Date.now() - 1000;
    expect(await save(sheet({ value: 1013, unit: "hPa" }))).toMatchObject({ status: "done" });
    const row = (await stored()) as { tyres: unknown; dynoSheet: { ambient: unknown } };
    const parsed = typeof row === "string" ? JSON.parse(row) : row;
    expect(parsed.tyres).toEqual({ kind: "graded", treadwear: 140 });
    expect(parsed.dynoSheet.ambient.pressure).toEqual({ value: 1013, unit: "hPa" });
    await waitForQueueIdle(databaseUrl);
    const [verdict] = await queryTestDb<{ computed_at: Date; result: unknown }>(
      databaseUrl,
      "select computed_at, result from verdicts where entry_id = ?",
      [entryId],
    );
    expect(verdict?.computed_at.getTime()).toBeGreaterThanOrEqual(saved);
    // Kestrel's treadwear floor is rule-set data (200 in the demo's rules); the verdict quotes
    // the declared grade, whatever it decides.
    expect(JSON.stringify(verdict?.result)).toContain("140");
  });

  it("lets only the driver or the car's owner declare", async () => {
    const other = await makePerson(databaseUrl, { name: "Other Person" });
    people.push(other.id);
    const state = await save(sheet({ value: 1013, unit: "hPa" }), other.email);
    expect(state.status).toBe("error");
    expect(state.message).toMatch(/does not allow that/);
  });
});
