import { describe, expect, it } from "vitest";
import { jsonDepth } from "@/lib/http/json-depth";

// Source: RFC 8259 §2 — arrays and objects are the only structures that nest; strings may hold
// brackets and escaped quotes, which are not structure.
describe("jsonDepth", () => {
  it("counts how deeply arrays and objects nest", () => {
    expect(jsonDepth('"x"')).toBe(0);
    expect(jsonDepth('[{"status":"idle"},"$K1"]')).toBe(2);
    expect(jsonDepth(`${"[".repeat(5000)}${"]".repeat(5000)}`)).toBe(5000);
  });

  it("does not count brackets inside strings, escaped quotes included", () => {
    expect(jsonDepth(JSON.stringify(["[[[[", '"[[[', "\\"]))).toBe(1);
    expect(jsonDepth(JSON.stringify({ a: '"}]]]', b: ["x"] }))).toBe(2);
  });
});
