import { describe, expect, it } from "vitest";
import { contentSecurityPolicy } from "@/lib/http/content-security-policy";
import { securityHeaders } from "@/lib/http/security-headers";

// Source: RFC 6797 §6.1 (Strict-Transport-Security, max-age in seconds; only over HTTPS — a
// browser ignores it on plain HTTP); W3C CSP Level 3 (nonce-source, 'strict-dynamic',
// frame-ancestors, upgrade-insecure-requests from W3C Upgrade Insecure Requests).
describe("security headers", () => {
  it("sends HSTS only when the app is served over HTTPS", () => {
    expect(securityHeaders({ https: false })["Strict-Transport-Security"]).toBeUndefined();
    expect(securityHeaders({ https: true })["Strict-Transport-Security"]).toMatch(
      /^max-age=31536000/,
    );
  });

  it("lets the camera to the app itself and nothing else", () => {
    const policy = securityHeaders({ https: false })["Permissions-Policy"];
    expect(policy).toContain("camera=(self)");
    expect(policy).toContain("microphone=()");
    expect(policy).toContain("geolocation=()");
  });

  it("runs scripts only with this response's nonce, never inline or eval, and is never framed", () => {
    const policy = contentSecurityPolicy({ nonce: "abc123", https: false });
    const script = policy.split("; ").find((d) => d.startsWith("script-src")) ?? "";
    expect(script).toBe("script-src 'self' 'nonce-abc123' 'strict-dynamic'");
    expect(policy).not.toContain("unsafe-eval");
    expect(policy).toContain("frame-ancestors 'none'");
    expect(policy).toContain("object-src 'none'");
    expect(policy).not.toContain("upgrade-insecure-requests");
    expect(contentSecurityPolicy({ nonce: "x", https: true })).toContain(
      "upgrade-insecure-requests",
    );
  });
});
