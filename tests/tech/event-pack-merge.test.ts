import "fake-indexeddb/auto";
import { describe, expect, it } from "vitest";
import type { EventPack, PackRecord, PackVerdict } from "@/lib/offline/event-pack-schema";
import { loadEventPack } from "@/lib/offline/load-event-pack";
import { saveEventPack } from "@/lib/offline/save-event-pack";
import { testPack } from "./test-pack";

// How the phone keeps its event pack (fake-indexeddb, from npm, plays the phone's IndexedDB). A
// partial pack carries only what changed since the phone's cursor; merged into what is stored it
// must give what a whole pack would. The contract is the pack route's (lib/tech/build-event-pack).
const T0 = Date.parse("2027-06-05T08:00:00.000Z");
const at = (seconds: number) => new Date(T0 + seconds * 1000).toISOString();

const verdict = (
  entryId: string,
  status: PackVerdict["status"],
  computedSecond: number,
): PackVerdict => ({
  entryId,
  status,
  classId: status === "held" ? null : "k1",
  reason: `${status} at ${computedSecond}`,
  flags: [],
  needsChief: false,
  override: null,
  rejectedOverride: null,
  implausibleReadings: [],
  computedAt: at(computedSecond),
});

const record = (id: string, entryId: string, receivedSecond: number): PackRecord => ({
  id,
  entryId,
  kind: "note",
  payload: { text: id },
  officialId: "official-1",
  deviceId: "phone-1",
  deviceTime: at(receivedSecond - 1),
  receivedAt: at(receivedSecond),
});

function pack(
  eventId: string,
  parts: Partial<EventPack> & Pick<EventPack, "verdicts" | "records">,
): EventPack {
  return testPack(eventId, {
    entryIds: ["a", "b", "c"],
    generatedAt: at(0),
    recordsCursor: at(-10),
    ...parts,
  });
}

describe("saveEventPack", () => {
  it("merges a partial pack's verdicts by entry and its records by id, keeping the rest", async () => {
    const eventId = "event-merge";
    await saveEventPack(
      pack(eventId, {
        verdicts: [verdict("a", "waiting", 1), verdict("b", "cleared", 2)],
        records: [record("r1", "a", 1), record("r2", "b", 2)],
      }),
      new Date(T0),
    );
    const stored = await saveEventPack(
      pack(eventId, {
        partial: true,
        etag: '"e2"',
        recordsCursor: at(20),
        verdicts: [verdict("a", "held", 30)],
        records: [record("r3", "a", 29), record("r1", "a", 1)],
      }),
      new Date(T0 + 31_000),
    );
    // Car a's verdict is the new one; car b's, not in the partial pack, is kept.
    expect(stored.verdicts.map((v) => [v.entryId, v.status]).sort()).toEqual([
      ["a", "held"],
      ["b", "cleared"],
    ]);
    expect(stored.records.map((r) => r.id).sort()).toEqual(["r1", "r2", "r3"]);
    expect(stored).toMatchObject({ partial: false, etag: '"e2"', recordsCursor: at(20) });
    expect(await loadEventPack(eventId)).toEqual(stored);
  });

  it("never lets an older verdict arriving last replace a newer one", async () => {
    const eventId = "event-order";
    await saveEventPack(
      pack(eventId, { verdicts: [verdict("a", "held", 50)], records: [] }),
      new Date(T0),
    );
    // A slower refresh, read before the verdict above was computed, is saved after it.
    const stored = await saveEventPack(
      pack(eventId, { partial: true, verdicts: [verdict("a", "waiting", 40)], records: [] }),
      new Date(T0 + 60_000),
    );
    expect(stored.verdicts).toEqual([verdict("a", "held", 50)]);
  });

  it("replaces everything with a whole pack (a verdict gone from the server goes from the phone)", async () => {
    const eventId = "event-whole";
    await saveEventPack(
      pack(eventId, {
        verdicts: [verdict("a", "held", 5), verdict("b", "cleared", 5)],
        records: [record("r1", "a", 5)],
      }),
      new Date(T0),
    );
    const stored = await saveEventPack(
      pack(eventId, { verdicts: [verdict("a", "cleared", 9)], records: [] }),
      new Date(T0 + 10_000),
    );
    expect(stored.verdicts).toEqual([verdict("a", "cleared", 9)]);
    expect(stored.records).toEqual([]);
  });

  it("keeps the entries and rule set it holds when a refresh leaves them out", async () => {
    const eventId = "event-kept";
    const first = pack(eventId, { verdicts: [], records: [], entriesTag: "t1", ruleSet: { v: 1 } });
    await saveEventPack(first, new Date(T0));
    const stored = await saveEventPack(
      pack(eventId, {
        partial: true,
        etag: '"e2"',
        verdicts: [],
        records: [record("r1", "a", 5)],
        entries: [],
        entriesTag: "t1",
        keptEntries: true,
        ruleSet: null,
        keptRuleSet: true,
      }),
      new Date(T0 + 10_000),
    );
    expect(stored.entries).toEqual(first.entries);
    expect(stored.ruleSet).toEqual({ v: 1 });
    expect(stored).toMatchObject({ etag: '"e2"', keptEntries: false, keptRuleSet: false });
  });

  it("asks for the whole pack next time when what it holds is not what the refresh assumed", async () => {
    const eventId = "event-kept-stale";
    await saveEventPack(
      pack(eventId, { verdicts: [], records: [], entriesTag: "t1" }),
      new Date(T0),
    );
    const stored = await saveEventPack(
      pack(eventId, {
        partial: true,
        verdicts: [],
        records: [],
        entries: [],
        entriesTag: "t2", // another refresh stored other entries meanwhile: what it holds is not "t2"
        keptEntries: true,
      }),
      new Date(T0 + 10_000),
    );
    // No cursor and no ETag: the next refresh is a whole pack, entries and all.
    expect(stored).toMatchObject({ recordsCursor: null, etag: "" });
  });
});
