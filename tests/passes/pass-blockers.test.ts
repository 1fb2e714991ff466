import { describe, expect, it } from "vitest";
import { passBlockers } from "@/lib/passes/pass-blockers";

const ready = { entryStatus: "entered", waiver: "signed", paid: true, eventOver: false } as const;

describe("passBlockers", () => {
  it("is empty for an entered, signed, paid entry before the event ends", () => {
    expect(passBlockers(ready)).toEqual([]);
  });

  it("names each missing step", () => {
    expect(passBlockers({ ...ready, waiver: "missing", paid: false })).toHaveLength(2);
    expect(passBlockers({ ...ready, waiver: "needs-guardian" })[0]).toMatch(/guardian/);
    expect(passBlockers({ ...ready, paid: false })[0]).toMatch(/entry fee/);
  });

  it("says only that the entry was withdrawn, or that the event is over", () => {
    expect(passBlockers({ ...ready, entryStatus: "withdrawn", paid: false })).toEqual([
      "This entry was withdrawn, so it has no pass.",
    ]);
    expect(passBlockers({ ...ready, eventOver: true })[0]).toMatch(/over/);
  });
});
