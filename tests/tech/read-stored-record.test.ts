import { afterEach, describe, expect, it, vi } from "vitest";
import { readStoredRecord } from "@/lib/tech/read-stored-record";
import { lengthReading } from "../scrutineer/fixtures";

// Test values, not trade facts: a reading as the engine's fixtures make it, stored and read back.
afterEach(() => {
  vi.restoreAllMocks();
});

describe("readStoredRecord: a stored record read through the record schema", () => {
  it("reads a record once: the same id gives back the record already read", () => {
    const stored = JSON.parse(JSON.stringify(lengthReading(1, "wingSpanMm", 1600)));
    const first = readStoredRecord(stored);
    expect(first).toMatchObject({ id: stored.id, kind: "reading" });
    expect(readStoredRecord(JSON.parse(JSON.stringify(stored)))).toBe(first);
  });

  it("gives null for a row that does not read as a record, and says so in the log", () => {
    const log = vi.spyOn(console, "error").mockImplementation(() => undefined);
    const damaged = {
      ...JSON.parse(JSON.stringify(lengthReading(2, "wingSpanMm", 1600))),
      kind: "x",
    };
    expect(readStoredRecord(damaged)).toBeNull();
    expect(log).toHaveBeenCalledWith(
      "[verdicts] a stored record does not read as one",
      damaged.id,
      expect.any(String),
    );
  });
});
