import { describe, expect, it } from "vitest";
import { requestOriginProblem } from "@/lib/auth/request-origin-problem";

const app = "http://127.0.0.1:3000";

describe("requestOriginProblem", () => {
  it("lets a request for APP_URL's host and scheme start a sign-in", () => {
    expect(requestOriginProblem(new Headers({ host: "127.0.0.1:3000" }), app)).toBeNull();
    expect(
      requestOriginProblem(
        new Headers({ "x-forwarded-host": "127.0.0.1:3000", "x-forwarded-proto": "http" }),
        app,
      ),
    ).toBeNull();
  });
  it("refuses another host or scheme, whichever header names it", () => {
    // Source: OWASP Forgot Password Cheat Sheet — never build a link from the Host header.
    const cases: Record<string, string>[] = [
      { "x-forwarded-host": "evil.example", host: "127.0.0.1:3000" },
      { host: "evil.example" },
      { host: "localhost:3000" },
      { host: "127.0.0.1:3000", "x-forwarded-proto": "https" },
    ];
    for (const headers of cases) {
      expect(requestOriginProblem(new Headers(headers), app), JSON.stringify(headers)).toMatch(
        /Sign in at http:\/\/127\.0\.0\.1:3000/,
      );
    }
  });
});
