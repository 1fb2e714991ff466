import { describe, expect, it } from "vitest";
import { carStateWhy } from "@/components/clerk/car-state-why";
import type { ClerkCar } from "@/lib/run-sheet/clerk-view";

// Our own wording rule (no outside source): a car that cannot run says why in one sentence.
const base: ClerkCar = {
  entryId: "e1",
  carNumber: 1,
  car: "Test car",
  drivers: "Driver 1",
  declaredClassName: "Kestrel",
  runsInClassName: null,
  status: "held",
  reason: "Held — fix and re-present: harness label expired.",
  signOn: { signedOn: true, missing: [] },
  withdrawn: false,
  reinspection: null,
  ready: false,
};

describe("why a car cannot run", () => {
  it("ends a held car's reason with one full stop", () => {
    expect(carStateWhy(base)).toBe("Held — fix and re-present: harness label expired.");
  });

  it("names a re-inspection and what the sign-on desk still needs", () => {
    const why = carStateWhy({
      ...base,
      status: "waiting",
      reason: null,
      signOn: { signedOn: false, missing: ["Entry fee not paid"] },
      reinspection: {
        id: "r1",
        cause: "protest",
        askedBy: "Car 7's entrant",
        askedAt: "2026-05-16T10:00:00Z",
        reason: "wing looks higher",
      },
    });
    expect(why).toBe(
      "Re-inspection asked by Car 7's entrant (protest): wing looks higher. Entry fee not paid.",
    );
  });

  it("says nothing for a ready car", () => {
    expect(carStateWhy({ ...base, status: "cleared", reason: null, ready: true })).toBeNull();
  });
});
