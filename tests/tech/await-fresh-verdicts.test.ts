import "fake-indexeddb/auto";
import { afterEach, beforeEach, describe, expect, it, vi } from "vitest";
import { awaitFreshVerdicts } from "@/lib/offline/await-fresh-verdicts";
import type { EventPack, PackVerdict } from "@/lib/offline/event-pack-schema";
import { loadEventPack } from "@/lib/offline/load-event-pack";
import { saveEventPack } from "@/lib/offline/save-event-pack";
import { testPack } from "./test-pack";

// After a sync the phone looks for the server's new verdicts: the poll against a stand-in for the
// pack route (ETag, `since`, format 2), with fake timers and fake-indexeddb (npm) as the phone's
// storage. The schedule (300 ms, doubling, 15 s) is the product's own choice (no source).
const T0 = Date.parse("2027-06-05T09:00:00.000Z");
const RECEIVED_AT = new Date(T0).toISOString();

const verdict = (entryId: string, status: PackVerdict["status"], computedAtMs: number) => ({
  entryId,
  status,
  classId: null,
  reason: `${status}`,
  flags: [],
  needsChief: false,
  override: null,
  rejectedOverride: null,
  implausibleReadings: [],
  computedAt: new Date(computedAtMs).toISOString(),
});

function pack(
  eventId: string,
  parts: Pick<EventPack, "etag" | "partial" | "verdicts"> &
    Partial<Pick<EventPack, "pendingVerdicts">>,
) {
  return testPack(eventId, {
    entryIds: ["a", "b"],
    generatedAt: new Date(Date.now()).toISOString(),
    recordsCursor: new Date(Date.now() - 10_000).toISOString(),
    ...parts,
  });
}

/**
 * A stand-in server whose worker finishes car `entryId`'s verdict `freshAfter[entryId]` ms after
 * the batch was received (never, for null). It answers 304 to the ETag of what it holds and,
 * to a phone sending `since`, only the verdicts computed since (all recomputed ones, here).
 */
function standInServer(
  eventId: string,
  freshAfter: Record<string, number | null>,
  /** Cars still being re-derived (listed in the pack's pendingVerdicts) until this many ms. */
  pendingUntil: Record<string, number> = {},
) {
  const calls: { at: number; since: string | null; format: string | null }[] = [];
  const fetchImpl = (async (input: unknown, init?: RequestInit) => {
    const url = new URL(String(input), "http://phone.test");
    const elapsed = Date.now() - T0;
    calls.push({
      at: elapsed,
      since: url.searchParams.get("since"),
      format: url.searchParams.get("format"),
    });
    const done = Object.entries(freshAfter).flatMap(([entryId, after]) =>
      after !== null && elapsed >= after ? [verdict(entryId, "held", T0 + after)] : [],
    );
    const pendingVerdicts = Object.entries(pendingUntil).flatMap(([entryId, until]) =>
      elapsed < until ? [entryId] : [],
    );
    const etag = `"${done.map((v) => v.entryId).join(",")}|${pendingVerdicts.join(",")}"`;
    if (new Headers(init?.headers).get("if-none-match") === etag)
      return new Response(null, { status: 304, headers: { etag } });
    return new Response(
      JSON.stringify(
        pack(eventId, {
          etag,
          partial: url.searchParams.has("since"),
          verdicts: done,
          pendingVerdicts,
        }),
      ),
      { status: 200, headers: { "content-type": "application/json", etag } },
    );
  }) as typeof fetch;
  return { calls, fetchImpl };
}

/** The phone's pack before the sync: both cars' verdicts older than the batch. */
async function storeStalePack(eventId: string) {
  await saveEventPack(
    pack(eventId, {
      etag: '""',
      partial: false,
      verdicts: [verdict("a", "waiting", T0 - 60_000), verdict("b", "cleared", T0 - 60_000)],
    }),
    new Date(),
  );
}

/** Let the poll run: IndexedDB works on real tasks; the clock moves only when the poll waits. */
async function settle<T>(promise: Promise<T>): Promise<T> {
  let outcome: { value: T } | undefined;
  void promise.then((value) => {
    outcome = { value };
  });
  for (let step = 0; step < 100_000; step += 1) {
    if (outcome) return outcome.value;
    if (vi.getTimerCount() > 0) vi.advanceTimersToNextTimer();
    else await new Promise((resolve) => setImmediate(resolve));
  }
  throw new Error("the poll never settled");
}

/** Run until the poll waits on its first timer. */
async function untilWaiting() {
  for (let step = 0; step < 100_000 && vi.getTimerCount() === 0; step += 1)
    await new Promise((resolve) => setImmediate(resolve));
}

beforeEach(() => {
  // setImmediate stays real: fake-indexeddb schedules its work with it.
  vi.useFakeTimers({ toFake: ["setTimeout", "clearTimeout", "Date"], now: T0 });
});
afterEach(() => {
  vi.useRealTimers();
});

describe("awaitFreshVerdicts", () => {
  it("looks after 300 ms, then at doubling waits, and stops once the verdict is fresh", async () => {
    const eventId = "event-fresh";
    await storeStalePack(eventId);
    const cursor = (await loadEventPack(eventId))?.recordsCursor;
    const server = standInServer(eventId, { a: 1_000 });
    const outcome = await settle(
      awaitFreshVerdicts(
        { eventId, entryIds: ["a"], receivedAt: RECEIVED_AT },
        { fetchImpl: server.fetchImpl },
      ),
    );
    expect(outcome).toBe("fresh");
    expect(server.calls.map((c) => c.at)).toEqual([300, 900, 2_100]);
    // Partial refreshes: the stored cursor, and the format that carries only new verdicts.
    expect(server.calls[0]).toMatchObject({ since: cursor, format: "2" });
    const stored = await loadEventPack(eventId);
    expect(stored?.verdicts.find((v) => v.entryId === "a")?.status).toBe("held");
    expect(stored?.verdicts.find((v) => v.entryId === "b")?.status).toBe("cleared");
  });

  it("keeps looking while the server still lists the car as being re-derived", async () => {
    // A verdict computed after the batch's receive time, but read before the batch committed:
    // the batch's own job is still pending until 2 s, so that verdict does not count yet.
    const eventId = "event-pending";
    await storeStalePack(eventId);
    const server = standInServer(eventId, { a: 100 }, { a: 2_000 });
    const outcome = await settle(
      awaitFreshVerdicts(
        { eventId, entryIds: ["a"], receivedAt: RECEIVED_AT },
        { fetchImpl: server.fetchImpl },
      ),
    );
    expect(outcome).toBe("fresh");
    expect(server.calls.map((c) => c.at)).toEqual([300, 900, 2_100]);
  });

  it("gives up 15 s after the answer when the verdict never comes", async () => {
    const eventId = "event-slow";
    await storeStalePack(eventId);
    const server = standInServer(eventId, { a: null });
    const outcome = await settle(
      awaitFreshVerdicts(
        { eventId, entryIds: ["a"], receivedAt: RECEIVED_AT },
        { fetchImpl: server.fetchImpl },
      ),
    );
    expect(outcome).toBe("timed-out");
    expect(server.calls.map((c) => c.at)).toEqual([300, 900, 2_100, 4_500, 9_300, 15_000]);
  });

  it("never polls with no signal, and stops when a request cannot go through", async () => {
    const eventId = "event-offline";
    await storeStalePack(eventId);
    const server = standInServer(eventId, { a: 0 });
    const offline = await settle(
      awaitFreshVerdicts(
        { eventId, entryIds: ["a"], receivedAt: RECEIVED_AT },
        { fetchImpl: server.fetchImpl, isOnline: () => false },
      ),
    );
    expect(offline).toBe("offline");
    expect(server.calls).toEqual([]);
    let tries = 0;
    const lost = await settle(
      awaitFreshVerdicts(
        { eventId, entryIds: ["a"], receivedAt: RECEIVED_AT },
        {
          fetchImpl: (async () => {
            tries += 1;
            throw new TypeError("Failed to fetch");
          }) as typeof fetch,
        },
      ),
    );
    expect(lost).toBe("offline");
    expect(tries).toBe(1);
  });

  it("stops when the sign-in has expired", async () => {
    const eventId = "event-signed-out";
    await storeStalePack(eventId);
    let tries = 0;
    const outcome = await settle(
      awaitFreshVerdicts(
        { eventId, entryIds: ["a"], receivedAt: RECEIVED_AT },
        {
          fetchImpl: (async () => {
            tries += 1;
            return new Response(null, { status: 401 });
          }) as typeof fetch,
        },
      ),
    );
    expect(outcome).toBe("signed-out");
    expect(tries).toBe(1);
  });

  it("keeps looking after a server error, until the deadline", async () => {
    const eventId = "event-500";
    await storeStalePack(eventId);
    const calls: number[] = [];
    const outcome = await settle(
      awaitFreshVerdicts(
        { eventId, entryIds: ["a"], receivedAt: RECEIVED_AT },
        {
          fetchImpl: (async () => {
            calls.push(Date.now() - T0);
            return new Response(null, { status: 503 });
          }) as typeof fetch,
        },
      ),
    );
    expect(outcome).toBe("timed-out");
    expect(calls).toEqual([300, 900, 2_100, 4_500, 9_300, 15_000]);
  });

  it("runs one loop per event: a second answer joins it, and it waits for every car", async () => {
    const eventId = "event-join";
    await storeStalePack(eventId);
    const server = standInServer(eventId, { a: 0, b: 2_000 });
    const first = awaitFreshVerdicts(
      { eventId, entryIds: ["a"], receivedAt: RECEIVED_AT },
      { fetchImpl: server.fetchImpl },
    );
    await untilWaiting();
    vi.advanceTimersByTime(200);
    const second = awaitFreshVerdicts(
      { eventId, entryIds: ["b"], receivedAt: new Date(T0 + 200).toISOString() },
      { fetchImpl: server.fetchImpl },
    );
    expect(second).toBe(first);
    expect(await settle(first)).toBe("fresh");
    // One series, brought forward by the second answer (300 ms after it); car a alone fresh at
    // 500 and 1,100 ms does not end it.
    expect(server.calls.map((c) => c.at)).toEqual([500, 1_100, 2_300]);
  });

  it("does not fetch when the stored verdicts are already fresh or the car has left the event", async () => {
    const eventId = "event-current";
    await saveEventPack(
      pack(eventId, { etag: '""', partial: false, verdicts: [verdict("a", "held", T0 + 5)] }),
      new Date(),
    );
    const server = standInServer(eventId, { a: 0 });
    const outcome = await settle(
      awaitFreshVerdicts(
        { eventId, entryIds: ["a", "withdrawn-car"], receivedAt: RECEIVED_AT },
        { fetchImpl: server.fetchImpl },
      ),
    );
    expect(outcome).toBe("fresh");
    expect(server.calls).toEqual([]);
  });
});
