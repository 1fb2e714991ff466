import { describe, expect, it } from "vitest";
import { limitMessage, signInLimitRules, waitMinutes } from "@/lib/auth/sign-in-limit-rules";

describe("sign-in limit rules", () => {
  it("words the wait in whole minutes, rounded up", () => {
    expect(waitMinutes(15 * 60_000)).toBe(15);
    expect(waitMinutes(14 * 60_000 + 1)).toBe(15);
    expect(waitMinutes(10)).toBe(1);
    expect(limitMessage(signInLimitRules.passwordPerAccount, 15 * 60_000)).toBe(
      "Too many sign-in attempts for this address. Try again in 15 minutes.",
    );
    expect(limitMessage(signInLimitRules.passwordPerAccount, 30_000)).toBe(
      "Too many sign-in attempts for this address. Try again in 1 minute.",
    );
  });
  it("allows an account fewer guesses than a shared network, and a network a busy morning", () => {
    // Source: NIST SP 800-63B §5.2.2 — limit consecutive failed attempts on a single account to
    // no more than 100; common practice (no source) — one paddock Wi-Fi address for everyone.
    expect(signInLimitRules.passwordPerAccount.points).toBeLessThanOrEqual(100);
    expect(signInLimitRules.passwordPerClient.points).toBeGreaterThan(
      signInLimitRules.passwordPerAccount.points,
    );
    expect(signInLimitRules.linkPerClient.points).toBeGreaterThanOrEqual(50);
  });
});
