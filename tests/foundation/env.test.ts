import { describe, expect, it } from "vitest";
import { assertServerCanStart, DEMO_AUTH_SECRET, parseEnv, serverStartProblems } from "@/lib/env";

const realSecret = "a-real-secret-of-forty-characters-xxxxxxx";

describe("parseEnv", () => {
  it("is live unless the demo is asked for, with the local services on 127.0.0.1", () => {
    const env = parseEnv({});
    expect(env.PLUMBLINE_MODE).toBe("live");
    expect(new URL(env.DATABASE_URL.replace("mysql:", "http:")).hostname).toBe("127.0.0.1");
    expect(env.SMTP_HOST).toBe("127.0.0.1");
    expect(new URL(env.S3_ENDPOINT).hostname).toBe("127.0.0.1");
    expect(env.SESSION_MAX_AGE_HOURS).toBeGreaterThanOrEqual(24);
  });
  it("gives the published secret to the demo only", () => {
    expect(parseEnv({ PLUMBLINE_MODE: "demo" }).AUTH_SECRET).toBe(DEMO_AUTH_SECRET);
    expect(parseEnv({}).AUTH_SECRET).toBeUndefined();
  });
  it("refuses the demo secret in live mode and says which variable", () => {
    expect(() => parseEnv({ AUTH_SECRET: DEMO_AUTH_SECRET })).toThrow(/AUTH_SECRET/);
    expect(() => parseEnv({ PLUMBLINE_MODE: "live", AUTH_SECRET: DEMO_AUTH_SECRET })).toThrow(
      /AUTH_SECRET/,
    );
  });
  it("lists every bad variable at once", () => {
    expect(() => parseEnv({ SMTP_PORT: "99999", APP_URL: "not a url" })).toThrow(
      /SMTP_PORT[\s\S]*APP_URL|APP_URL[\s\S]*SMTP_PORT/,
    );
  });
  it("builds with no environment at all (next build parses it)", () => {
    expect(() => parseEnv({})).not.toThrow();
  });
});

describe("serverStartProblems", () => {
  it("stops a live server without its own secret and address, naming both", () => {
    const problems = serverStartProblems({});
    expect(problems.join("\n")).toMatch(/AUTH_SECRET/);
    expect(problems.join("\n")).toMatch(/APP_URL/);
    expect(() => assertServerCanStart({})).toThrow(/refusing to start a live server/);
  });
  it("stops a live server with no proxy in front: a client could choose its own address", () => {
    const problems = serverStartProblems({
      AUTH_SECRET: realSecret,
      APP_URL: "https://tech.example.org",
    });
    expect(problems).toHaveLength(1);
    expect(problems[0]).toMatch(/^TRUSTED_PROXY_HOPS: serve Plumbline behind a reverse proxy/);
  });
  it("starts live with a secret, an address and a proxy, and the demo when asked", () => {
    expect(
      serverStartProblems({
        AUTH_SECRET: realSecret,
        APP_URL: "https://tech.example.org",
        TRUSTED_PROXY_HOPS: "1",
      }),
    ).toEqual([]);
    expect(serverStartProblems({ PLUMBLINE_MODE: "demo" })).toEqual([]);
  });
});
