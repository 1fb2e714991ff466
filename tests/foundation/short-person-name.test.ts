import { describe, expect, it } from "vitest";
import { shortPersonName } from "@/lib/auth/short-person-name";

// Names are invented; the short form (first name and last initial) is our own choice.
describe("shortPersonName", () => {
  it("shortens to the first name and the last name's initial", () => {
    expect(shortPersonName("Priya Raman")).toBe("Priya R.");
    expect(shortPersonName("  Mary Anne  de  Vries ")).toBe("Mary V.");
    expect(shortPersonName("Ólafur Þórsson")).toBe("Ólafur Þ.");
  });

  it("keeps one word as it is, and an address as an address (never the part before the @)", () => {
    expect(shortPersonName("Gareth")).toBe("Gareth");
    expect(shortPersonName("clerk@bm.test")).toBe("clerk@bm.test");
    expect(shortPersonName("clerk@brackenmoor.test")).toBe("clerk@brackenmo…");
  });

  it("cuts a very long first name with an ellipsis", () => {
    expect(shortPersonName("Wolfeschlegelsteinhausen Bergerdorff")).toBe("Wolfeschlegelst…");
    expect(Array.from(shortPersonName("Wolfeschlegelsteinhausen Bergerdorff"))).toHaveLength(16);
  });
});
