import { afterEach, describe, expect, it, vi } from "vitest";
import { parseStoredVerdict } from "@/lib/entries/parse-stored-verdict";
import { evaluateEntry } from "@/lib/scrutineer/verdicts/evaluate-entry";
import { clubRuleSet, input, lengthReading } from "../scrutineer/fixtures";

// Test values, not trade facts: one reading is enough to make a stored verdict to read back.
const verdict = evaluateEntry(
  input({
    ruleSet: clubRuleSet(),
    records: [lengthReading(1, "wingSpanMm", 1600)],
    declaredClassId: "club",
  }),
);

afterEach(() => {
  vi.restoreAllMocks();
});

describe("parseStoredVerdict: the verdicts table's JSON, read through the verdict schema", () => {
  it("reads back a verdict as the engine made it, through JSON as the database keeps it", () => {
    const stored: unknown = JSON.parse(JSON.stringify(verdict));
    expect(parseStoredVerdict({ entryId: "e-1", result: stored })).toEqual(verdict);
  });

  it("reads one entry's stored JSON once, and reads it again when it changes", () => {
    const stored: unknown = JSON.parse(JSON.stringify(verdict));
    const first = parseStoredVerdict({ entryId: "e-9", result: stored });
    expect(first).toEqual(verdict);
    // The same JSON again: the verdict already read (the same object), not a second parse.
    const again: unknown = JSON.parse(JSON.stringify(verdict));
    expect(parseStoredVerdict({ entryId: "e-9", result: again })).toBe(first);
    // Other JSON for that entry (a new verdict, or damage): read through the schema again.
    const changed = { ...(stored as object), reason: "another reason" };
    const second = parseStoredVerdict({ entryId: "e-9", result: changed });
    expect(second?.reason).toBe("another reason");
    vi.spyOn(console, "error").mockImplementation(() => undefined);
    expect(
      parseStoredVerdict({ entryId: "e-9", result: { ...changed, status: "bogus" } }),
    ).toBeNull();
  });

  it("gives a verdict stored before `rejectedOverride` existed its default", () => {
    const { rejectedOverride: _, ...older } = verdict;
    expect(parseStoredVerdict({ entryId: "e-2", result: older })?.rejectedOverride).toBeNull();
  });

  it("treats a row that does not match as no verdict, and logs which entry once", () => {
    const log = vi.spyOn(console, "error").mockImplementation(() => {});
    const damaged = { ...verdict, flags: 7, override: "the chief" };
    expect(parseStoredVerdict({ entryId: "e-3", result: damaged })).toBeNull();
    expect(parseStoredVerdict({ entryId: "e-3", result: damaged })).toBeNull();
    expect(log).toHaveBeenCalledTimes(1);
    expect(String(log.mock.calls[0]?.[0])).toMatch(/entry e-3 .*flags/);
    expect(parseStoredVerdict({ entryId: "e-4", result: ["not", "a", "verdict"] })).toBeNull();
    expect(log).toHaveBeenCalledTimes(2);
  });

  it("is silent about an entry with no stored verdict at all", () => {
    const log = vi.spyOn(console, "error").mockImplementation(() => {});
    expect(parseStoredVerdict({ entryId: "e-5", result: null })).toBeNull();
    expect(log).not.toHaveBeenCalled();
  });
});
