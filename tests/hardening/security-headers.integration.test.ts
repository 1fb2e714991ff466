// Security headers on every response: a page (CSP with a fresh nonce that Next puts on its
// scripts), a route handler, and the service worker script.
// Source: W3C Content Security Policy Level 3 (nonce-source, 'strict-dynamic', frame-ancestors);
// Fetch Standard §X-Content-Type-Options (nosniff); W3C Permissions Policy (camera=(self)).
import { describe, expect, inject, it } from "vitest";

const appUrl = inject("appUrl");

const common = (headers: Headers) => {
  expect(headers.get("x-content-type-options")).toBe("nosniff");
  expect(headers.get("referrer-policy")).toBe("strict-origin-when-cross-origin");
  expect(headers.get("permissions-policy")).toMatch(/(^|, )camera=\(self\)/);
  expect(headers.get("content-security-policy")).toMatch(/frame-ancestors 'none'/);
  // Served over http on loopback: no HSTS (a browser would ignore it there anyway).
  expect(headers.get("strict-transport-security")).toBeNull();
};

describe("security headers", () => {
  it("a page carries a CSP whose nonce is on every script the page has", async () => {
    const response = await fetch(`${appUrl}/sign-in`);
    expect(response.status).toBe(200);
    common(response.headers);
    const policy = response.headers.get("content-security-policy") ?? "";
    const nonce = /'nonce-([^']+)'/.exec(policy)?.[1];
    expect(nonce).toBeTruthy();
    expect(policy).toMatch(/script-src 'self' 'nonce-[^']+' 'strict-dynamic'/);
    expect(policy).not.toMatch(/script-src[^;]*'unsafe-inline'/);
    const html = await response.text();
    const scripts = [...html.matchAll(/<script\b[^>]*>/g)].map((m) => m[0]);
    expect(scripts.length).toBeGreaterThan(0);
    for (const tag of scripts) expect(tag).toContain(`nonce="${nonce}"`);
    const second = await fetch(`${appUrl}/sign-in`);
    expect(second.headers.get("content-security-policy")).not.toBe(policy);
  });

  it("a route handler carries the headers and a CSP that runs nothing", async () => {
    const response = await fetch(`${appUrl}/api/health`);
    common(response.headers);
    expect(response.headers.get("content-security-policy")).toMatch(/default-src 'none'/);
  });

  it("the service worker script carries them too", async () => {
    const response = await fetch(`${appUrl}/sw.js`);
    expect(response.status).toBe(200);
    common(response.headers);
    expect(response.headers.get("content-security-policy")).toMatch(/connect-src 'self'/);
  });
});
