import { afterEach, describe, expect, it, vi } from "vitest";
import { nextSaturday } from "@/db/seed/seed-demo";
import { parseEnv } from "@/lib/env";
import { testSeedDay } from "../support/test-clock";

const REAL_SECRET = "a-real-secret-for-this-test-only-0123456789";

afterEach(() => {
  vi.doUnmock("@/lib/env");
  vi.resetModules();
  vi.useRealTimers();
});

/** lib/clock.ts as a server with this environment would load it. */
async function clockWith(source: Record<string, string>) {
  vi.resetModules();
  vi.doMock("@/lib/env", () => ({ env: parseEnv(source) }));
  return (await import("@/lib/clock")).clock;
}

describe("PLUMBLINE_FAKE_NOW", () => {
  it("is accepted in demo mode as an ISO 8601 instant with a zone", () => {
    expect(
      parseEnv({ PLUMBLINE_MODE: "demo", PLUMBLINE_FAKE_NOW: "2031-06-02T09:00:00Z" })
        .PLUMBLINE_FAKE_NOW,
    ).toBe("2031-06-02T09:00:00Z");
    expect(parseEnv({ PLUMBLINE_MODE: "demo", PLUMBLINE_FAKE_NOW: "" }).PLUMBLINE_FAKE_NOW).toBe(
      undefined,
    );
  });

  it("is refused outside demo mode, and when it is not an instant", () => {
    expect(() =>
      parseEnv({
        PLUMBLINE_MODE: "live",
        AUTH_SECRET: REAL_SECRET,
        PLUMBLINE_FAKE_NOW: "2031-06-02T09:00:00Z",
      }),
    ).toThrow(/PLUMBLINE_FAKE_NOW: a fake clock is for the demo and the tests only/);
    expect(() => parseEnv({ PLUMBLINE_MODE: "demo", PLUMBLINE_FAKE_NOW: "next tuesday" })).toThrow(
      /PLUMBLINE_FAKE_NOW/,
    );
    expect(() => parseEnv({ PLUMBLINE_MODE: "demo", PLUMBLINE_FAKE_NOW: "2031-06-02" })).toThrow(
      /PLUMBLINE_FAKE_NOW/,
    );
  });
});

describe("clock.now()", () => {
  it("is the real clock when no fake one is set", async () => {
    vi.useFakeTimers({ now: Date.parse("2026-12-03T07:00:00Z") });
    const clock = await clockWith({ PLUMBLINE_MODE: "demo" });
    expect(clock.now().toISOString()).toBe("2026-12-03T07:00:00.000Z");
  });

  it("starts at PLUMBLINE_FAKE_NOW and runs on at the real pace", async () => {
    vi.useFakeTimers({ now: Date.parse("2026-12-03T07:00:00Z") });
    delete (globalThis as { plumblineClock?: unknown }).plumblineClock;
    const clock = await clockWith({
      PLUMBLINE_MODE: "demo",
      PLUMBLINE_FAKE_NOW: "2031-06-02T09:00:00Z",
    });
    expect(clock.now().toISOString()).toBe("2031-06-02T09:00:00.000Z");
    vi.advanceTimersByTime(90_000);
    expect(clock.now().toISOString()).toBe("2031-06-02T09:01:30.000Z");
    delete (globalThis as { plumblineClock?: unknown }).plumblineClock;
  });
});

describe("testSeedDay: the day the test databases are seeded for", () => {
  it("puts the demo event 1 to 7 days after the clock's date, whatever the weekday", () => {
    // Source: Gregorian calendar — 19 April 2027 is a Monday, 24 April 2027 a Saturday.
    expect(nextSaturday(testSeedDay(new Date("2027-04-19T09:00:00Z")))).toBe("2027-04-24");
    // A Saturday clock: the event is the next Saturday, never the day the tests run.
    expect(nextSaturday(testSeedDay(new Date("2027-04-24T23:30:00Z")))).toBe("2027-05-01");
    for (let d = 0; d < 14; d += 1) {
      const clock = new Date(Date.UTC(2031, 5, 1 + d, 12));
      const ahead =
        (Date.parse(nextSaturday(testSeedDay(clock))) - Date.UTC(2031, 5, 1 + d)) / 864e5;
      expect(ahead).toBeGreaterThanOrEqual(1);
      expect(ahead).toBeLessThanOrEqual(7);
    }
  });
});
