import { afterAll, describe, expect, inject, it } from "vitest";
import { demo } from "../support/demo-accounts";
import { HttpSession } from "../support/http-session";
import { postSync } from "../support/post-sync";
import { makeScratchEntries, removeScratchEntries } from "../support/scratch-entries";
import { startAppServer } from "../support/start-app-server";
import { countRecords, readingRecord, techFixtures } from "../support/tech-fixtures";
import { testServiceEnv } from "../support/test-env";

const appUrl = inject("appUrl");
const databaseUrl = inject("databaseUrl");

let scratch: string[] = [];
afterAll(() => removeScratchEntries(databaseUrl, scratch));

describe("a sync interrupted by the server stopping", () => {
  it("loses nothing and doubles nothing when the phone replays every batch", async () => {
    const fx = await techFixtures(databaseUrl);
    const officialId = await fx.userId(demo.scrutineer);
    // Cars of this test's own: the readings below would change the demo cars' verdicts, which
    // other test files read.
    scratch = await makeScratchEntries(databaseUrl, fx.eventId, 8);
    const entries = scratch.map((id) => ({ id }));
    // 12 batches of 40 readings over many cars, as a phone's outbox would send them.
    const batches = Array.from({ length: 12 }, (_, b) =>
      Array.from({ length: 40 }, (_, i) => {
        const entry = entries[(b * 40 + i) % entries.length];
        return readingRecord({
          entryId: entry?.id ?? "",
          officialId,
          deviceId: "phone-c",
          dimension: "roofPeakFromGroundMm",
          valueMm: 1300 + (i % 5) * 0.1,
          at: new Date(Date.now() + b * 100 + i),
        });
      }),
    );
    const ids = batches.flat().map((r) => r.id);

    // A second app server on the same database, which we stop while the batches are in flight.
    const port = 3250;
    const doomed = await startAppServer({ port, env: testServiceEnv(databaseUrl, port) });
    const session = new HttpSession(doomed.url);
    await session.signInWithPassword(demo.scrutineer, demo.password);
    const send = (s: HttpSession, batch: unknown[]) => postSync(s, fx.eventId, "phone-c", batch);
    const inFlight = batches.map((batch) =>
      send(session, batch).then(
        (r) => r.status,
        () => "lost" as const,
      ),
    );
    await Promise.race(inFlight);
    await doomed.stop("SIGKILL");
    const outcomes = await Promise.all(inFlight);
    const stored = await countRecords(databaseUrl, ids);
    // Each batch is one transaction: what reached the database is whole batches.
    expect(stored % 40).toBe(0);
    expect(outcomes.filter((o) => o === 200).length * 40).toBeLessThanOrEqual(stored);

    // The phone replays everything it did not see acknowledged (here: all of it) to the live server.
    const replay = new HttpSession(appUrl);
    await replay.signInWithPassword(demo.scrutineer, demo.password);
    for (const batch of batches) {
      const response = await send(replay, batch);
      expect(response.status).toBe(200);
    }
    expect(await countRecords(databaseUrl, ids)).toBe(ids.length);
  });
});
