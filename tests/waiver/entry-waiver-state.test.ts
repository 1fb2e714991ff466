import { describe, expect, it } from "vitest";
import { entryWaiverState } from "@/lib/entries/entry-waiver-state";

// Each driver signs the waiver in full; a minor needs a parent or guardian too — common practice
// (no source), as DOMAIN.md "Entries, fees and waivers" states it.
const adult = (signerId: string) => ({ signerId, isMinor: false, guardianSignedAt: null });
const minor = (signerId: string, co: Date | null) => ({
  signerId,
  isMinor: true,
  guardianSignedAt: co,
});

describe("entryWaiverState", () => {
  it("needs every driver: driver and accepted co-driver", () => {
    expect(entryWaiverState(["d", null], [adult("d")])).toBe("signed");
    expect(entryWaiverState(["d", "c"], [adult("d")])).toBe("missing");
    expect(entryWaiverState(["d", "c"], [adult("d"), adult("c")])).toBe("signed");
  });

  it("waits for a minor's guardian once every driver has signed", () => {
    expect(entryWaiverState(["d", "c"], [minor("d", null), adult("c")])).toBe("needs-guardian");
    expect(entryWaiverState(["d", "c"], [minor("d", null)])).toBe("missing");
    expect(entryWaiverState(["d", "c"], [minor("d", new Date()), adult("c")])).toBe("signed");
  });

  it("does not count a signature from someone who is not a driver", () => {
    expect(entryWaiverState(["d", null], [adult("someone-else")])).toBe("missing");
    expect(entryWaiverState([], [])).toBe("missing");
  });
});
