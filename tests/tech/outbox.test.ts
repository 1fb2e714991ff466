import "fake-indexeddb/auto";
import { describe, expect, it } from "vitest";
import { addLocalRecord } from "@/lib/offline/add-local-record";
import { backoffDelayMs } from "@/lib/offline/backoff-delay";
import { drainOutbox } from "@/lib/offline/drain-outbox";
import { listLocalRecords } from "@/lib/offline/list-local-records";
import { makeRecord } from "@/lib/offline/make-record";
import { requeueSignedOutRecords } from "@/lib/offline/requeue-signed-out-records";

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
        verdicts: [],
      })) as typeof fetch;
    const summary = await drainOutbox({ now: () => 1, fetchImpl });
    expect(summary).toMatchObject({ sent: 2, refused: 1, waiting: 0 });
    const states = new Map((await listLocalRecords(eventId)).map((r) => [r.record.id, r]));
    expect(states.get(a ?? "")?.state).toBe("sent");
    expect(states.get(b ?? "")?.state).toBe("duplicate");
    expect(states.get(c ?? "")?.state).toBe("refused");
    expect(states.get(c ?? "")?.lastError).toMatch(/negative/);
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
        return answer(200, { results: [], verdicts: [] });
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
          verdicts: [],
        })) as typeof fetch,
    });
    expect((await listLocalRecords(eventId))[0]?.state).toBe("sent");
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
