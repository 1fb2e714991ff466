import { describe, expect, it } from "vitest";
import { multipartHeadersProblem } from "@/lib/http/multipart-headers-problem";

// Source: RFC 9110 §5.5 — field values are visible characters, spaces and tabs; RFC 7578 §4.2 —
// each part has a Content-Disposition header naming the field.
const form = (name: string) =>
  `--B\r\nContent-Disposition: form-data; name="${name}"\r\n\r\nvalue with\u0000nul in the body\r\n--B--\r\n`;

describe("multipartHeadersProblem", () => {
  it("reads a form whose part headers are plain text (a NUL in a value is the value's business)", () => {
    expect(multipartHeadersProblem(form("email"), "multipart/form-data; boundary=B")).toBeNull();
    expect(multipartHeadersProblem(form("a\tb"), "multipart/form-data; boundary=B")).toBeNull();
  });

  it("refuses a part header with a control character in it", () => {
    expect(multipartHeadersProblem(form("\u0000"), "multipart/form-data; boundary=B")).toMatch(
      /cannot be sent/,
    );
    expect(multipartHeadersProblem(form("a\u007fb"), 'multipart/form-data; boundary="B"')).toMatch(
      /cannot be sent/,
    );
  });

  it("refuses a form cut short before its close delimiter", () => {
    const cut = form("email").replace("--B--\r\n", "");
    expect(multipartHeadersProblem(cut, "multipart/form-data; boundary=B")).toMatch(/cut short/);
    expect(multipartHeadersProblem("junk", "multipart/form-data; boundary=x")).toMatch(/cut short/);
  });

  it("refuses a form with no boundary", () => {
    expect(multipartHeadersProblem(form("x"), "multipart/form-data")).toMatch(/no boundary/);
  });
});
