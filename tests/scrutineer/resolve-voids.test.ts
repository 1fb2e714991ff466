import fc from "fast-check";
import { describe, expect, it } from "vitest";
import type { TechRecord } from "@/lib/scrutineer/records/record-schema";
import { resolveRecords } from "@/lib/scrutineer/records/resolve-records";
import { resolveVoids } from "@/lib/scrutineer/records/resolve-voids";
import { voidedRecordIds } from "@/lib/scrutineer/records/voided-record-ids";
import { lengthReading, note, voidRecord } from "./fixtures";

// The void rule is our own product rule (no outside source): records are immutable, a void
// cancels its target unless the void is itself voided, and voids that loop are ignored.

/** A reading (record 1) and n voids chained onto it: void 2 voids 1, void 3 voids 2, … */
function chain(n: number): TechRecord[] {
  const records: TechRecord[] = [lengthReading(1, "wingOverhangMm", 150)];
  for (let i = 2; i <= n + 1; i += 1) records.push(voidRecord(i, i - 1, "chained"));
  return records;
}

describe("resolveVoids: the one void rule", () => {
  it("resolves 100,000 chained voids without running out of stack", () => {
    const records = chain(100_001); // odd: the reading is void
    const ids = voidedRecordIds(records);
    expect(ids.has(records[0]?.id ?? "")).toBe(true);
    expect(ids.size).toBe(50_001);
  });

  it("counts each void once however the chains branch (work grows with the records, not faster)", () => {
    // Two chains of 50,000 into one reading, plus a loop of 50,000 voids: every record is
    // touched a bounded number of times, so this finishes in a blink whatever the shape.
    const records: TechRecord[] = [lengthReading(1, "wingOverhangMm", 150)];
    for (let i = 2; i <= 50_001; i += 1) records.push(voidRecord(i, i === 2 ? 1 : i - 1));
    for (let i = 60_000; i < 110_000; i += 1) records.push(voidRecord(i, i === 60_000 ? 1 : i - 1));
    for (let i = 200_000; i < 250_000; i += 1)
      records.push(voidRecord(i, i === 249_999 ? 200_000 : i + 1));
    const resolved = resolveVoids(records);
    expect(resolved.inCycle.size).toBe(50_000);
    // Each chain of 50,000 ends (at its bottom void) in force or not by parity: even → the
    // bottom void is cancelled, so neither chain voids the reading.
    expect(resolved.voided.has(records[0]?.id ?? "")).toBe(false);
  });

  it("undoes a void by voiding it, ignores loops, and lets a void aimed into a loop stand", () => {
    const reading = lengthReading(1, "wingOverhangMm", 150);
    expect(voidedRecordIds([reading, voidRecord(2, 1)])).toEqual(new Set([reading.id]));
    expect(voidedRecordIds([reading, voidRecord(2, 1), voidRecord(3, 2)]).has(reading.id)).toBe(
      false,
    );
    const loop = resolveVoids([reading, voidRecord(4, 5), voidRecord(5, 4), voidRecord(6, 4)]);
    expect([...loop.inCycle].sort()).toEqual([voidRecord(4, 5).id, voidRecord(5, 4).id]);
    expect(loop.voided.has(reading.id)).toBe(false);
  });

  // Random void graphs over 3 readings/notes and up to 12 voids aimed at any record (loops,
  // chains, several voids of one record, voids of missing records).
  const graphs = fc
    .array(fc.integer({ min: 1, max: 16 }), { minLength: 0, maxLength: 12 })
    .map((targets) => {
      const records: TechRecord[] = [
        lengthReading(1, "wingOverhangMm", 150),
        lengthReading(2, "wingSpanMm", 1500),
        note(3, "bumper loose"),
      ];
      for (const [i, t] of targets.entries()) records.push(voidRecord(4 + i, t));
      return records;
    });

  it("the screens' set of void records is the engine's count", () => {
    fc.assert(
      fc.property(graphs, (records) => {
        const resolved = resolveRecords(records, "entry-1");
        const present = new Set(records.map((r) => r.id));
        const struck = [...voidedRecordIds(records)].filter((id) => present.has(id));
        expect(struck.length).toBe(resolved.counts.voided);
      }),
      { numRuns: 300 },
    );
  });
});
