import { afterAll, beforeAll, describe, expect, inject, it } from "vitest";
import { readSyncAnswer } from "../support/await-verdicts";
import { demo } from "../support/demo-accounts";
import { HttpSession } from "../support/http-session";
import { postSync } from "../support/post-sync";
import { queryTestDb } from "../support/query-test-db";
import { makeScratchEntries, removeScratchEntries } from "../support/scratch-entries";
import { readingRecord, techFixtures } from "../support/tech-fixtures";

// Issue 8, item 12: a reading that cannot be true (a wing top 99,999 mm above the ground, 64½ in
// typed as an overhang) is kept as saved but marked for the chief scrutineer, with the words.

const appUrl = inject("appUrl");
const databaseUrl = inject("databaseUrl");

type SyncAnswer = {
  results: { id: string | null; status: string; reason?: string }[];
  verdicts: { entryId: string; flags: string[]; needsChief: boolean }[];
};

let fx: Awaited<ReturnType<typeof techFixtures>>;
let sam: HttpSession;
let samId: string;
let entryId = "";
afterAll(() => removeScratchEntries(databaseUrl, [entryId]));

beforeAll(async () => {
  fx = await techFixtures(databaseUrl);
  sam = new HttpSession(appUrl);
  await sam.signInWithPassword(demo.scrutineer, demo.password);
  samId = await fx.userId(demo.scrutineer);
  // A car of this file's own (a copy of a measured demo car, without its records).
  const template = (await fx.entryNumbers())[25]?.id;
  entryId = (await makeScratchEntries(databaseUrl, fx.eventId, 1, template))[0] ?? "";
});

describe("a reading that cannot be true (POST /sync)", () => {
  it("is stored, and puts the car in the chief scrutineer's queue with why", async () => {
    const at = Date.now();
    const wingTop = readingRecord({
      entryId,
      officialId: samId,
      deviceId: "phone-implausible",
      dimension: "wingTopFromGroundMm",
      valueMm: 99_999,
      at: new Date(at),
    });
    // Source: NIST SP 811 App. B.8 — 1 in = 25.4 mm exactly: 64.5 in = 1638.3 mm, a car's
    // width typed where an overhang (a few hundred millimetres at most) belongs.
    const overhang = readingRecord({
      entryId,
      officialId: samId,
      deviceId: "phone-implausible",
      dimension: "wingOverhangMm",
      valueMm: 64.5 * 25.4,
      at: new Date(at + 1),
    });
    const response = await postSync(sam, fx.eventId, "phone-implausible", [wingTop, overhang]);
    expect(response.status).toBe(200);
    const body = (await readSyncAnswer(sam, fx.eventId, response)) as SyncAnswer;
    expect(body.results.map((r) => r.status)).toEqual(["stored", "stored"]);
    const verdict = body.verdicts.find((v) => v.entryId === entryId);
    expect(verdict?.flags).toContain("implausible-reading");
    expect(verdict?.needsChief).toBe(true);

    const [row] = await queryTestDb<{ needs_chief: number; result: unknown }>(
      databaseUrl,
      "select needs_chief, result from verdicts where entry_id = ?",
      [entryId],
    );
    expect(Number(row?.needs_chief)).toBe(1);
    const result = (typeof row?.result === "string" ? JSON.parse(row.result) : row?.result) as {
      implausibleReadings: { recordId: string; why: string }[];
    };
    const why = new Map(result.implausibleReadings.map((r) => [r.recordId, r.why]));
    expect(why.get(wingTop.id)).toMatch(/^Wing top 99,999 mm above the ground/);
    expect(why.get(wingTop.id)).toMatch(/check the number and the unit/);
    expect(why.get(overhang.id)).toMatch(/^Wing overhang 1,638\.3 mm/);

    // The chief scrutineer's page lists the car and asks for the reading to be checked.
    const chief = new HttpSession(appUrl);
    await chief.signInWithPassword(demo.chief, demo.password);
    const page = await (await chief.fetch(`/tech/${fx.eventId}/chief`)).text();
    expect(page).toContain("Check this reading:");
    // …with the very words that say why, not only a general line.
    expect(page).toContain("Wing top 99,999 mm above the ground");
  });
});
