import { describe, expect, it } from "vitest";
import { parseEnv } from "@/lib/env";

describe("parseEnv", () => {
  it("gives the demo everything on 127.0.0.1 by default", () => {
    const env = parseEnv({});
    expect(env.PLUMBLINE_MODE).toBe("demo");
    expect(new URL(env.DATABASE_URL.replace("mysql:", "http:")).hostname).toBe("127.0.0.1");
    expect(env.SMTP_HOST).toBe("127.0.0.1");
    expect(new URL(env.S3_ENDPOINT).hostname).toBe("127.0.0.1");
    expect(env.SESSION_MAX_AGE_HOURS).toBeGreaterThanOrEqual(24);
  });
  it("refuses the demo secret in live mode and says which variable", () => {
    expect(() => parseEnv({ PLUMBLINE_MODE: "live" })).toThrow(/AUTH_SECRET/);
  });
  it("lists every bad variable at once", () => {
    expect(() => parseEnv({ SMTP_PORT: "99999", APP_URL: "not a url" })).toThrow(
      /SMTP_PORT[\s\S]*APP_URL|APP_URL[\s\S]*SMTP_PORT/,
    );
  });
});
