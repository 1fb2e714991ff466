import { afterAll, beforeAll, describe, expect, inject, it } from "vitest";
import { readSyncAnswer } from "../support/await-verdicts";
import { demo } from "../support/demo-accounts";
import { HttpSession } from "../support/http-session";
import { postSync } from "../support/post-sync";
import { queryTestDb } from "../support/query-test-db";
import { makeScratchEntries, removeScratchEntries } from "../support/scratch-entries";
import { readingRecord, techFixtures } from "../support/tech-fixtures";

// Issue 8, item 13: a dyno sheet that cannot be true is refused with a reason, never thrown, and
// one entry's bad sheet never stops the recompute of the other cars.

const appUrl = inject("appUrl");
const databaseUrl = inject("databaseUrl");

type SyncAnswer = {
  results: { id: string | null; status: string; reason?: string }[];
  verdicts: { entryId: string; status: string; reason: string }[];
};
type StoredRule = { ruleId: string; outcome: string; reason: string };
type StoredVerdict = { classChecks: { rules: StoredRule[] }[]; records: { total: number } };

let fx: Awaited<ReturnType<typeof techFixtures>>;
let sam: HttpSession;
let samId: string;
const entries: { id: string; carNumber: number }[] = [];
afterAll(() =>
  removeScratchEntries(
    databaseUrl,
    entries.map((e) => e.id),
  ),
);

/** A sheet in the older STD correction, so the server must re-correct it with its pressures. */
function sheet(ambient: Record<string, unknown>) {
  return {
    aero: { wing: true, splitter: true, diffuser: false },
    dynoSheet: {
      power: { value: 200, unit: "hp" },
      measuredAt: "wheel",
      correction: "std",
      ambient,
      date: "2026-01-15",
    },
    tyres: { kind: "graded", treadwear: 200 },
    modificationPoints: 5,
    driverWeightKg: 80,
    ballastKg: 0,
  };
}

async function storedVerdict(entryId: string): Promise<StoredVerdict> {
  const [row] = await queryTestDb<{ result: unknown }>(
    databaseUrl,
    "select result from verdicts where entry_id = ?",
    [entryId],
  );
  return (typeof row?.result === "string" ? JSON.parse(row.result) : row?.result) as StoredVerdict;
}

const powerRules = (v: StoredVerdict) =>
  v.classChecks.flatMap((c) => c.rules).filter((r) => r.ruleId === "power-to-weight");

beforeAll(async () => {
  fx = await techFixtures(databaseUrl);
  sam = new HttpSession(appUrl);
  await sam.signInWithPassword(demo.scrutineer, demo.password);
  samId = await fx.userId(demo.scrutineer);
  // Copies of three measured demo cars (their declarations and class, none of their records),
  // so the sheets and readings written here change no car another file reads.
  const demoCars = await fx.entryNumbers();
  for (const index of [22, 23, 24]) {
    const [copy] = await makeScratchEntries(databaseUrl, fx.eventId, 1, demoCars[index]?.id);
    entries.push({ id: copy ?? "", carNumber: 0 });
  }
});

describe("dyno sheets that cannot be true (stored before the check existed)", () => {
  it("are refused in the verdict's words, and the other cars in the batch are still recomputed", async () => {
    const steam = entries[0]?.id ?? ""; // vapour pressure equal to the air pressure
    const heavyAir = entries[1]?.id ?? ""; // 2,000 mbar: twice any air pressure on Earth
    const good = entries[2]?.id ?? "";
    // Written straight to the table, as a sheet saved before the declarations were checked.
    await queryTestDb(databaseUrl, "update entries set declarations = ? where id = ?", [
      JSON.stringify(
        sheet({
          pressure: { value: 1000, unit: "mbar" },
          vapourPressure: { value: 1000, unit: "mbar" },
          temperature: { value: 20, unit: "C" },
        }),
      ),
      steam,
    ]);
    await queryTestDb(databaseUrl, "update entries set declarations = ? where id = ?", [
      JSON.stringify(
        sheet({ pressure: { value: 2000, unit: "mbar" }, temperature: { value: 20, unit: "C" } }),
      ),
      heavyAir,
    ]);

    const at = Date.now();
    const batch = [steam, heavyAir, good].map((entryId, i) =>
      readingRecord({
        entryId,
        officialId: samId,
        deviceId: "phone-dyno",
        dimension: "wingSpanMm",
        valueMm: 1500,
        at: new Date(at + i),
      }),
    );
    const response = await postSync(sam, fx.eventId, "phone-dyno", batch);
    expect(response.status).toBe(200);
    const body = (await readSyncAnswer(sam, fx.eventId, response)) as SyncAnswer;
    expect(body.results.map((r) => r.status)).toEqual(["stored", "stored", "stored"]);
    expect(body.verdicts.map((v) => v.entryId).sort()).toEqual([steam, heavyAir, good].sort());

    // The good car's verdict counts the new reading.
    const goodCount = await queryTestDb<{ n: number }>(
      databaseUrl,
      "select count(*) as n from records where entry_id = ?",
      [good],
    );
    expect((await storedVerdict(good)).records.total).toBe(Number(goodCount[0]?.n));

    // The bad sheets: power-to-weight waits, and says why in words a scrutineer can read out.
    const steamRules = powerRules(await storedVerdict(steam));
    expect(steamRules.length).toBeGreaterThan(0);
    for (const r of steamRules) {
      expect(r.outcome).toBe("waiting");
      expect(r.reason).toMatch(/vapour pressure/i);
      expect(r.reason).toMatch(/dyno sheet/);
    }
    const heavyRules = powerRules(await storedVerdict(heavyAir));
    expect(heavyRules.length).toBeGreaterThan(0);
    for (const r of heavyRules) {
      expect(r.outcome).toBe("waiting");
      // Source: WMO World Weather & Climate Extremes Archive — highest sea-level pressure on
      // record 1083.8 hPa (Agata, 1968); 2,000 mbar is far beyond any weather.
      expect(r.reason).toMatch(/air pressure 2,000 mbar/);
    }
  });
});
