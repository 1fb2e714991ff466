import "fake-indexeddb/auto";
import { clear } from "idb-keyval";
import { beforeEach, describe, expect, it } from "vitest";
import { addLocalRecord } from "@/lib/offline/add-local-record";
import { backoffDelayMs } from "@/lib/offline/backoff-delay";
import { drainOutbox } from "@/lib/offline/drain-outbox";
import { idbStores } from "@/lib/offline/idb-stores";
import { listLocalRecords } from "@/lib/offline/list-local-records";
import { makeRecord } from "@/lib/offline/make-record";
import { requeueSignedOutRecords } from "@/lib/offline/requeue-signed-out-records";
import { resetOutboxBackoff } from "@/lib/offline/reset-outbox-backoff";

// The outbox against a stand-in server (a fetch function with the sync endpoint's contract);
// fake-indexeddb (npm) plays the phone's IndexedDB. The real endpoint is covered by the
// integration tests and the browser journey.
const reading = (eventId: string, n: number) => ({
  eventId,
  record: makeRecord({
    kind: "reading",
    payload: {
      dimension: "wingSpanMm",
      value: 1400 + n,
      instrument: { id: "tape", name: "Tape", standardUncertainty: 0.5 },
    },
    entryId: "entry-1",
    officialId: "official-1",
    deviceId: "phone-1",
    now: new Date(1_800_000_000_000 + n),
  }),
  now: 0,
});

const answer = (status: number, body: unknown): Response =>
  new Response(JSON.stringify(body), { status, headers: { "content-type": "application/json" } });

describe("the outbox", () => {
  it("marks stored and duplicate records sent, keeps a refused one with its reason", async () => {
    const eventId = "event-a";
    const items = [reading(eventId, 1), reading(eventId, 2), reading(eventId, 3)];
    for (const item of items) await addLocalRecord(item);
    const [a, b, c] = items.map((i) => i.record.id);
    const fetchImpl = (async () =>
      answer(200, {
        results: [
          { id: a, status: "stored" },
          { id: b, status: "duplicate" },
          { id: c, status: "refused", reason: "value: wingSpanMm cannot be negative" },
        ],
      })) as typeof fetch;
    const summary = await drainOutbox({ now: () => 1, fetchImpl });
    expect(summary).toMatchObject({ sent: 2, refused: 1, waiting: 0 });
    const states = new Map((await listLocalRecords(eventId)).map((r) => [r.record.id, r]));
    expect(states.get(a ?? "")?.state).toBe("sent");
    expect(states.get(b ?? "")?.state).toBe("duplicate");
    expect(states.get(c ?? "")?.state).toBe("refused");
    expect(states.get(c ?? "")?.lastError).toMatch(/negative/);
  });

  it("hands on the entries whose verdicts the server will recompute, per batch with its receive time", async () => {
    const eventId = "event-g";
    const items = [reading(eventId, 60), reading(eventId, 61)];
    for (const item of items) await addLocalRecord(item);
    const receivedAt = "2027-06-05T09:00:00.000Z";
    const summary = await drainOutbox({
      now: () => 1,
      fetchImpl: (async () =>
        answer(200, {
          results: items.map((i) => ({ id: i.record.id, status: "stored" })),
          receivedAt,
          verdictsPending: ["entry-1"],
        })) as typeof fetch,
    });
    expect(summary.verdictsPending).toEqual([{ eventId, entryIds: ["entry-1"], receivedAt }]);
    // An answer without the field (an older server) asks for no wait.
    const more = reading(eventId, 62);
    await addLocalRecord(more);
    const quiet = await drainOutbox({
      now: () => 2,
      fetchImpl: (async () =>
        answer(200, {
          results: [{ id: more.record.id, status: "stored" }],
          receivedAt,
        })) as typeof fetch,
    });
    expect(quiet.sent).toBe(1);
    expect(quiet.verdictsPending).toEqual([]);
  });

  it("keeps everything queued, with a later attempt time, when there is no signal", async () => {
    const eventId = "event-b";
    await addLocalRecord(reading(eventId, 10));
    const fetchImpl = (async () => {
      throw new TypeError("Failed to fetch");
    }) as typeof fetch;
    const summary = await drainOutbox({ now: () => 1000, random: () => 0.5, fetchImpl });
    expect(summary.waiting).toBe(1);
    const [item] = await listLocalRecords(eventId);
    expect(item?.state).toBe("queued");
    expect(item?.attempts).toBe(1);
    expect(item?.nextAttemptAt).toBe(1000 + backoffDelayMs(1, 0.5));
    // Not due yet: a second drain at the same moment sends nothing.
    let calls = 0;
    await drainOutbox({
      now: () => 1000,
      fetchImpl: (async () => {
        calls += 1;
        return answer(200, { results: [] });
      }) as typeof fetch,
    });
    expect(calls).toBe(0);
  });

  it("holds the queue when the sign-in has expired, and sends it after signing in again", async () => {
    const eventId = "event-c";
    const item = reading(eventId, 20);
    await addLocalRecord(item);
    await drainOutbox({
      now: () => 5,
      fetchImpl: (async () => answer(401, { error: { code: "unauthenticated" } })) as typeof fetch,
    });
    expect((await listLocalRecords(eventId))[0]?.state).toBe("needs-sign-in");
    expect(await requeueSignedOutRecords(eventId)).toBe(1);
    await drainOutbox({
      now: () => 10,
      fetchImpl: (async () =>
        answer(200, {
          results: [{ id: item.record.id, status: "stored" }],
        })) as typeof fetch,
    });
    expect((await listLocalRecords(eventId))[0]?.state).toBe("sent");
  });
});

describe("the retry wait", () => {
  // Each case starts with an empty outbox: a drain sends every event's due records.
  beforeEach(async () => {
    await clear(idbStores().records);
  });
  const stored = (ids: string[]) =>
    (async () =>
      answer(200, {
        results: ids.map((id) => ({ id, status: "stored" })),
      })) as unknown as typeof fetch;
  const noSignal = (async () => {
    throw new TypeError("Failed to fetch");
  }) as typeof fetch;

  it("Send now forgets the wait and sends at once", async () => {
    const eventId = "event-d";
    const item = reading(eventId, 30);
    await addLocalRecord(item);
    await drainOutbox({ now: () => 1000, random: () => 0.5, fetchImpl: noSignal });
    const [waiting] = await listLocalRecords(eventId);
    expect(waiting?.nextAttemptAt).toBeGreaterThan(1000);
    expect(waiting?.lastError).toBe("No signal; will try again.");

    // What "Send now" does: reset, then drain — still at the same moment, well inside the wait.
    expect(await resetOutboxBackoff({ now: 1001, eventId })).toBe(1);
    const [reset] = await listLocalRecords(eventId);
    expect(reset).toMatchObject({
      state: "queued",
      attempts: 0,
      nextAttemptAt: 0,
      lastError: null,
    });
    let calls = 0;
    const summary = await drainOutbox({
      now: () => 1001,
      fetchImpl: (async (...args: Parameters<typeof fetch>) => {
        calls += 1;
        return stored([item.record.id])(...args);
      }) as typeof fetch,
    });
    expect(calls).toBe(1);
    expect(summary.sent).toBe(1);
    expect((await listLocalRecords(eventId))[0]?.state).toBe("sent");
  });

  it("a request that goes through sends the records that were waiting out a retry, in the same drain", async () => {
    const eventId = "event-e";
    const old = reading(eventId, 40);
    await addLocalRecord(old);
    await drainOutbox({ now: () => 2000, random: () => 0.5, fetchImpl: noSignal });
    const fresh = reading(eventId, 41);
    await addLocalRecord(fresh);
    // Still inside the old record's wait: only the fresh one is due, but its success shows
    // there is signal, so the old one goes too.
    const bodies: string[][] = [];
    const summary = await drainOutbox({
      now: () => 2001,
      fetchImpl: (async (_url: unknown, init?: RequestInit) => {
        const ids = (JSON.parse(String(init?.body)) as { records: { id: string }[] }).records.map(
          (r) => r.id,
        );
        bodies.push(ids);
        return answer(200, {
          results: ids.map((id) => ({ id, status: "stored" })),
        });
      }) as typeof fetch,
    });
    expect(bodies).toEqual([[fresh.record.id], [old.record.id]]);
    expect(summary.sent).toBe(2);
    expect((await listLocalRecords(eventId)).map((r) => r.state)).toEqual(["sent", "sent"]);
  });

  it("leaves refused and signed-out records alone", async () => {
    const eventId = "event-f";
    const held = reading(eventId, 50);
    await addLocalRecord(held);
    await drainOutbox({
      now: () => 5,
      fetchImpl: (async () => answer(401, { error: { code: "unauthenticated" } })) as typeof fetch,
    });
    expect(await resetOutboxBackoff({ now: 6, eventId })).toBe(0);
    expect((await listLocalRecords(eventId))[0]?.state).toBe("needs-sign-in");
  });
});

describe("backoffDelayMs", () => {
  it("doubles per attempt, is capped, and jitters between half and one and a half times", () => {
    // common practice (no source): exponential backoff with jitter for retries.
    expect(backoffDelayMs(1, 0.5)).toBe(2000);
    expect(backoffDelayMs(2, 0.5)).toBe(4000);
    expect(backoffDelayMs(3, 0)).toBe(4000);
    expect(backoffDelayMs(3, 0.999999)).toBeLessThanOrEqual(12_000);
    expect(backoffDelayMs(3, 0.999999)).toBeGreaterThan(11_900);
    expect(backoffDelayMs(30, 0.5)).toBe(120_000);
  });
});
