import { describe, expect, it } from "vitest";
import { tallyByLadder } from "@/lib/entries/tally-by-ladder";

// DOMAIN.md "Classes": classes are ordered low → high in the rule set; the tally follows that
// order, not the order cars happen to come in. Class names are invented.
const ladder = ["Wren", "Osprey", "Kite", "Eagle"];

describe("tallyByLadder", () => {
  it("counts in ladder order, low to high, with empty classes at 0", () => {
    expect(tallyByLadder(["Kite", "Wren", "Kite", "Osprey", "Wren", "Kite"], ladder)).toEqual([
      { name: "Wren", count: 2 },
      { name: "Osprey", count: 1 },
      { name: "Kite", count: 3 },
      { name: "Eagle", count: 0 },
    ]);
  });

  it("puts a class the ladder does not know after it rather than losing the car", () => {
    expect(tallyByLadder(["Zebra", "Wren", "Albatross"], ladder).map((t) => t.name)).toEqual([
      ...ladder,
      "Albatross",
      "Zebra",
    ]);
  });
});
