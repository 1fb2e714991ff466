import { describe, expect, it } from "vitest";
import { classMove } from "@/lib/entries/class-move";

// Class names here are invented; the rule is ours: a move-up runs the car in the class the
// verdict found it legal in (DOMAIN.md, "Classing"), and nothing else changes its class.
describe("classMove", () => {
  it("names the class the car runs in only where the verdict moved it up", () => {
    expect(classMove({ declaredClass: "Wren", finalClass: "Osprey", status: "moved-up" })).toEqual({
      declared: "Wren",
      runsIn: "Osprey",
    });
  });

  it("keeps the declared class for every other verdict, whatever finalClass says", () => {
    for (const status of ["waiting", "cleared", "re-measure", "held"] as const) {
      expect(classMove({ declaredClass: "Wren", finalClass: "Osprey", status }).runsIn).toBeNull();
    }
    expect(classMove({ declaredClass: "Wren", finalClass: "Wren", status: "moved-up" })).toEqual({
      declared: "Wren",
      runsIn: null,
    });
    expect(classMove({ declaredClass: "Wren", finalClass: null, status: "moved-up" }).runsIn).toBe(
      null,
    );
  });
});
