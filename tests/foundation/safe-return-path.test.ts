import { describe, expect, it } from "vitest";
import { safeReturnPath } from "@/lib/http/safe-return-path";

describe("safeReturnPath", () => {
  it("keeps same-site paths", () => {
    expect(safeReturnPath("/tech/abc?car=7")).toBe("/tech/abc?car=7");
  });
  it("refuses other sites and odd values", () => {
    // Source: OWASP Unvalidated Redirects and Forwards Cheat Sheet — allow only relative paths.
    for (const bad of [
      "https://evil.test/",
      "//evil.test",
      "/\\evil.test",
      // Browsers drop tabs and newlines from URLs and read a backslash as a slash.
      "/\t/evil.test",
      "/\n/evil.test",
      "/\t\\evil.test",
      "javascript:alert(1)",
      "",
      42,
      null,
    ]) {
      expect(safeReturnPath(bad)).toBe("/home");
    }
  });
});
