import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { voidChoices } from "@/components/tech/void-choices";
import type { TechRecord } from "@/lib/scrutineer/records/record-schema";
import { resolveRecords } from "@/lib/scrutineer/records/resolve-records";
import { lengthReading, note, voidRecord } from "./fixtures";

// The void rule is our own product rule (no outside source): records are immutable, a void
// cancels its target unless the void is itself voided, and voids that loop are ignored.

/** A reading (record 1) and n voids chained onto it: void 2 voids 1, void 3 voids 2, … */
function chain(n: number): TechRecord[] {
  const records: TechRecord[] = [lengthReading(1, "wingOverhangMm", 150)];
  for (let i = 2; i <= n + 1; i += 1) records.push(voidRecord(i, i - 1, "chained"));
  return records;
}

describe("the void rule on long chains (issue 8, item 9)", () => {
  it("resolves 2,000 chained voids in well under a second (the cubic walk took 15.7 s)", () => {
    const records = chain(2000);
    const started = performance.now();
    const resolved = resolveRecords(records, "entry-1");
    const elapsedMs = performance.now() - started;
    // 2,000 voids: the last is in force, so the 1,999th is void, … an even count leaves the
    // reading in force. Half the voids are cancelled.
    expect(resolved.readings).toHaveLength(1);
    expect(resolved.counts.voided).toBe(1000);
    // Generous bound: linear work here is a few milliseconds even on a loaded 2-core machine.
    expect(elapsedMs).toBeLessThan(1500);
  });

  it("resolves 100,000 chained voids without running out of stack", () => {
    const resolved = resolveRecords(chain(100_001), "entry-1"); // odd: the reading is void
    expect(resolved.readings).toHaveLength(0);
    expect(resolved.counts.voided).toBe(50_001);
  });
});

describe("one void rule for the engine and the screens (issue 8, item 15)", () => {
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

  it("the chief's void list marks exactly what the engine leaves out", () => {
    fc.assert(
      fc.property(graphs, (records) => {
        const used = new Set(resolveRecords(records, "entry-1").readings.map((r) => r.id));
        const listed = voidChoices({
          records,
          checklistLabel: () => undefined,
          officialName: () => "Dev Patel",
          unitSystem: "mm",
          timeZone: "Europe/London",
        }).flatMap((g) => g.choices);
        for (const c of listed) expect(c.voided).toBe(!used.has(c.id));
      }),
      { numRuns: 300 },
    );
  });
});
